// Screenshots of the Firmware section for a visual check (not a test):
//   npx tsx tests/visual/firmware/shoot.ts out-dir "robot=Greenhouse Cart" "robot=Bench Kiwi&check=1" …
// Starts the app with the demo club seeded, a Vite server for this harness that proxies /api to
// it, signs in as the club mentor, shoots each query at 1366×768 (FULL=1: the whole page).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startApp } from '../../e2e/support/app-server';
import { shootHarness } from '../shared/shoot-harness';

const distDir = mkdtempSync(join(tmpdir(), 'mw-fw-client-'));
// The app needs a client folder; an empty index is enough, the harness is the page we look at.
writeFileSync(join(distDir, 'index.html'), '<!doctype html><title>app</title>');
const app = await startApp({ client: distDir, seed: true });
const mentor = app.demoAccounts.find((a) => a.role === 'owner')!;

try {
  await shootHarness({
    harness: import.meta.url,
    title: 'Mixwright firmware harness',
    settleMs: 2000,
    proxy: {
      '/api': {
        target: app.url,
        configure: (proxy) => proxy.on('proxyReq', (req) => req.setHeader('origin', app.url)),
      },
    },
    // Cookies belong to the host, not the port: signing in on the app counts for the harness too.
    prepare: async (page) => {
      const signIn = await page.request.post(`${app.url}/api/auth/sign-in`, {
        data: { email: mentor.email, password: mentor.password },
        headers: { origin: app.url },
      });
      if (!signIn.ok()) throw new Error(`Sign-in failed: ${signIn.status()}`);
    },
    beforeShot: async ({ page, params }) => {
      if (params.get('check') !== '1') return;
      await page.getByRole('button', { name: 'Check that it compiles' }).click();
      await page.getByRole('button', { name: 'Check again' }).waitFor({ timeout: 120_000 });
    },
  });
} finally {
  await app.close();
  rmSync(distDir, { recursive: true, force: true });
}
