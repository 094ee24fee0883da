// Size of the JavaScript a browser must fetch before the first screen, gzipped: the entry
// script and every module it preloads (read from the built index.html). Budget: 300 KB.
// Lazy chunks (pages, editor sections, the drive preview) load on demand and are listed apart.
import { readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { build } from 'vite';

const root = fileURLToPath(new URL('..', import.meta.url));
const outDir = join(root, '.cache', 'bench-client');
const BUDGET_KB = 300;

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1).padStart(7)} KB`;
const gzipped = (file: string) => gzipSync(readFileSync(file), { level: 9 }).length;

/** The scripts index.html loads at once: its module entry and its modulepreload links. */
function initialScripts(html: string): string[] {
  const found = [
    ...html.matchAll(/<script[^>]*type="module"[^>]*src="([^"]+)"/g),
    ...html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="([^"]+)"/g),
  ];
  return [...new Set(found.map((m) => m[1]))];
}

export async function run(): Promise<void> {
  rmSync(outDir, { recursive: true, force: true });
  await build({
    root,
    configFile: join(root, 'vite.config.ts'),
    logLevel: 'silent',
    build: { outDir, emptyOutDir: true },
  });
  const html = readFileSync(join(outDir, 'index.html'), 'utf8');
  const initial = initialScripts(html);
  let total = 0;
  console.log('initial JavaScript (gzip level 9):');
  for (const src of initial) {
    const size = gzipped(join(outDir, src));
    total += size;
    console.log(`  ${kb(size)}  ${src}`);
  }
  console.log(`  ${kb(total)}  total, budget ${BUDGET_KB} KB: ${total / 1024 <= BUDGET_KB ? 'within' : 'OVER'}`);
  const assets = join(outDir, 'assets');
  const lazy = readdirSync(assets)
    .filter((f) => f.endsWith('.js') && !initial.some((src) => src.endsWith(f)))
    .map((f) => ({ f, raw: statSync(join(assets, f)).size, gz: gzipped(join(assets, f)) }))
    .sort((a, b) => b.gz - a.gz);
  console.log(
    `loaded on demand: ${lazy.length} chunks, ${kb(lazy.reduce((s, c) => s + c.gz, 0)).trim()} gzipped; largest:`,
  );
  for (const c of lazy.slice(0, 8)) console.log(`  ${kb(c.gz)}  ${c.f}`);
  rmSync(outDir, { recursive: true, force: true });
}
