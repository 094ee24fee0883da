// Screenshots of the wiring harness for a visual check (not a test):
//   npx tsx tests/visual/wiring/shoot.ts out-dir "board=uno&assign=1" "board=nano&part=sheet" …
// FULL=1 shoots the whole page; a query with part=sheet is also printed to PDF (A4 and Letter).
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
const theme = fileURLToPath(new URL('../../../src/index.css', import.meta.url));

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
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const page = await context.newPage();
  page.on('console', (m) => m.type() === 'error' && console.error('page:', m.text()));
  page.on('pageerror', (e) => console.error('page error:', e.message));
  for (const [i, query] of (queries.length ? queries : ['']).entries()) {
    await page.goto(`http://127.0.0.1:${port}/?${query}`);
    await page.waitForTimeout(1500);
    const params = new URLSearchParams(query);
    const hover = params.get('hover');
    if (hover) await page.hover(`[data-pin="${hover}"]`);
    const name = `${String(i).padStart(2, '0')}-${query.replace(/[^a-z0-9]+/gi, '_') || 'all'}`;
    const file = join(outDir, `${name}.png`);
    await page.screenshot({ path: file, fullPage: process.env.FULL === '1' });
    console.log(file);
    if (params.get('part') === 'sheet') {
      for (const format of ['A4', 'Letter'] as const) {
        const pdf = join(outDir, `${name}-${format}.pdf`);
        await page.pdf({ path: pdf, format, printBackground: true, ...(process.env.PDF_MARGIN ? { margin: { top: process.env.PDF_MARGIN, bottom: process.env.PDF_MARGIN, left: process.env.PDF_MARGIN, right: process.env.PDF_MARGIN } } : { preferCSSPageSize: true }) });
        console.log(pdf);
      }
      // The page as the printer sees it, at A4 width (210 mm at 96 px per inch, less 11 mm margins).
      await page.emulateMedia({ media: 'print' });
      await page.setViewportSize({ width: 711, height: 400 });
      const wide = await page.evaluate(() => {
        const limit = document.documentElement.clientWidth;
        return [...document.querySelectorAll('body *')].filter((e) => e.getBoundingClientRect().right > limit + 1).slice(0, 5).map((e) => `${e.tagName}.${e.className}`);
      });
      if (wide.length) console.log('wider than the page:', wide);
      const printed = join(outDir, `${name}-print.png`);
      await page.screenshot({ path: printed, fullPage: true });
      console.log(printed);
      await page.emulateMedia({ media: null });
      await page.setViewportSize({ width: 1366, height: 768 });
    }
  }
} finally {
  await context.close();
  await server.close();
  rmSync(profile, { recursive: true, force: true });
}
