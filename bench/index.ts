// `npm run bench`: prints performance figures. Figures, not pass/fail: no timed assertions.
// Each benchmark is a module in this folder exporting `run(): Promise<void>` that prints its own lines.
import { readdir } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv.slice(2);
const files = (await readdir(here)).filter((f) => f.endsWith('.bench.ts')).sort();
for (const file of files) {
  const name = file.replace(/\.bench\.ts$/, '');
  if (only.length > 0 && !only.includes(name)) continue;
  console.log(`\n== ${name}`);
  const module = (await import(`./${file}`)) as { run: () => Promise<void> };
  await module.run();
}
