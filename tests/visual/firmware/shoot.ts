// Screenshots of the Firmware section for a visual check (not a test):
//   npx tsx tests/visual/firmware/shoot.ts out-dir "robot=Greenhouse Cart" "robot=Bench Kiwi&check=1" …
// Starts the app with the demo club seeded, a Vite server for this harness that proxies /api to
// it, signs in as the club mentor, shoots each query at 1366×768 (FULL=1: the whole page).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { chromium } from 'playwright-core';
import { createServer } from 'vite';
import { aliases } from '../../../vite.config';
import { startApp } from '../../e2e/support/app-server';

const here = fileURLToPath(new URL('.', import.meta.url));
const [outDir = '/tmp/mixwright-shots', ...queries] = process.argv.slice(2);
const theme = fileURLToPath(new URL('../../../src/index.css', import.meta.url));
const distDir = mkdtempSync(join(tmpdir(), 'mw-fw-client-'));

// The app needs a client folder; an empty index is enough, the harness is the page we look at.
await import('node:fs').then((fs) => fs.writeFileSync(join(distDir, 'index.html'), '<!doctype html><title>app</title>'));
const app = await startApp({ client: distDir, seed: true });
const mentor = app.demoAccounts.find((a) => a.role === 'owner')!;

const server = await createServer({
  configFile: false,
  root: here,
  plugins: [react(), tailwindcss()],
  resolve: { alias: [{ find: /^mixwright-theme$/, replacement: theme }, ...Object.entries(aliases).map(([find, replacement]) => ({ find, replacement }))] },
  server: {
    port: 0,
    strictPort: false,
    host: '127.0.0.1',
    fs: { strict: false },
    proxy: { '/api': { target: app.url, configure: (proxy) => proxy.on('proxyReq', (req) => req.setHeader('origin', app.url)) } },
  },
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
  // Cookies belong to the host, not the port: signing in on the app counts for the harness too.
  const signIn = await page.request.post(`${app.url}/api/auth/sign-in`, { data: { email: mentor.email, password: mentor.password }, headers: { origin: app.url } });
  if (!signIn.ok()) throw new Error(`Sign-in failed: ${signIn.status()}`);
  for (const [i, query] of (queries.length ? queries : ['']).entries()) {
    await page.goto(`http://127.0.0.1:${port}/?${query}`);
    await page.waitForTimeout(2000);
    if (new URLSearchParams(query).get('check') === '1') {
      await page.getByRole('button', { name: 'Check that it compiles' }).click();
      await page.getByRole('button', { name: 'Check again' }).waitFor({ timeout: 120_000 });
    }
    const name = `${String(i).padStart(2, '0')}-${query.replace(/[^a-z0-9]+/gi, '_') || 'all'}`;
    const file = join(outDir, `${name}.png`);
    await page.screenshot({ path: file, fullPage: process.env.FULL === '1' });
    console.log(file);
  }
} finally {
  await context.close();
  await server.close();
  await app.close();
  rmSync(profile, { recursive: true, force: true });
  rmSync(distDir, { recursive: true, force: true });
}
