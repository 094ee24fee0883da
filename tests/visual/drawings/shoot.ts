// Screenshots of the drawings harness for a visual check (not a test):
//   MIXWRIGHT_THEME_CSS=/path/to/index.css npx tsx tests/visual/drawings/shoot.ts out-dir "layout=…&part=…" …
// Starts Vite on a free port, shoots each query at 1366×768, and stops the server.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { chromium } from 'playwright-core';
import { createServer } from 'vite';
import { aliases } from '../../../vite.config';

const here = fileURLToPath(new URL('.', import.meta.url));
const [outDir = '/tmp/mixwright-shots', ...queries] = process.argv.slice(2);
const theme = process.env.MIXWRIGHT_THEME_CSS ?? fileURLToPath(new URL('../../../src/index.css', import.meta.url));

const server = await createServer({
  configFile: false,
  root: here,
  plugins: [react(), tailwindcss()],
  resolve: { alias: [{ find: /^mixwright-theme$/, replacement: theme }, ...Object.entries(aliases).map(([find, replacement]) => ({ find, replacement }))] },
  server: { port: 0, strictPort: false, host: '127.0.0.1', fs: { strict: false } },
  logLevel: 'warn',
});
await server.listen();
const address = server.httpServer?.address();
const port = typeof address === 'object' && address ? address.port : 5173;
const profile = mkdtempSync(join(tmpdir(), 'mw-chrome-'));
const context = await chromium.launchPersistentContext(profile, {
  executablePath: '/usr/bin/chromium',
  headless: true,
  viewport: { width: 1366, height: 768 },
  deviceScaleFactor: Number(process.env.DPR ?? 1),
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const page = await context.newPage();
  page.on('console', (m) => m.type() === 'error' && console.error('page:', m.text()));
  page.on('pageerror', (e) => console.error('page error:', e.message));
  for (const [i, query] of (queries.length ? queries : ['']).entries()) {
    await page.goto(`http://127.0.0.1:${port}/?${query}`);
    await page.waitForTimeout(1200);
    // hold=w,e: focus the floor view and hold those keys for a while before the shot.
    const hold = new URLSearchParams(query).get('hold');
    if (hold) {
      await page.focus('[role=application]');
      for (const key of hold.split(',')) await page.keyboard.down(key);
      await page.waitForTimeout(Number(new URLSearchParams(query).get('ms') ?? 2500));
    }
    const file = join(outDir, `${String(i).padStart(2, '0')}-${query.replace(/[^a-z0-9]+/gi, '_') || 'all'}.png`);
    await page.screenshot({ path: file, fullPage: process.env.FULL === '1' });
    console.log(file);
    if (hold) for (const key of hold.split(',')) await page.keyboard.up(key);
  }
} finally {
  await context.close();
  await server.close();
  rmSync(profile, { recursive: true, force: true });
}
