// The Vite server and browser every screenshot harness shares. A harness folder holds main.tsx,
// harness.tsx and harness.css; its shoot.ts calls shootHarness with what it does before each shot.
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import type { Page } from 'playwright-core';
import { createServer, type Plugin, type ProxyOptions } from 'vite';
import { aliases } from '../../../vite.config';
import { openBrowser } from '../../e2e/support/browser';

export interface Shot {
  page: Page;
  query: string;
  params: URLSearchParams;
  /** The picture's file name without extension, e.g. `01-board_nano_part_sheet`. */
  name: string;
  outDir: string;
}

export interface ShootOptions {
  /** The harness's `import.meta.url`: its folder is the page's root. */
  harness: string;
  title: string;
  /** How long the page gets to settle after loading, before anything else. */
  settleMs: number;
  /** The query shot when the command line names none. */
  defaultQuery?: string;
  define?: Record<string, string>;
  proxy?: Record<string, ProxyOptions>;
  /** Runs once, before the first page is opened (e.g. signing in). */
  prepare?: (page: Page) => Promise<void>;
  beforeShot?: (shot: Shot) => Promise<void>;
  afterShot?: (shot: Shot) => Promise<void>;
}

/** The page Vite serves at `/`: one root element and the harness's main.tsx. */
function harnessPage(title: string): Plugin {
  const html = `<!doctype html>
<html lang="en">
  <head>
    <meta charset="UTF-8" />
    <meta name="viewport" content="width=device-width, initial-scale=1.0" />
    <title>${title}</title>
  </head>
  <body>
    <div id="root"></div>
    <script type="module" src="./main.tsx"></script>
  </body>
</html>
`;
  return {
    name: 'mixwright-harness-page',
    configureServer(server) {
      server.middlewares.use((req, res, next) => {
        if (new URL(req.url ?? '/', 'http://harness').pathname !== '/') return next();
        server.transformIndexHtml(req.url ?? '/', html).then((page) => {
          res.setHeader('Content-Type', 'text/html');
          res.end(page);
        }, next);
      });
    },
  };
}

async function startHarnessServer(options: ShootOptions) {
  const theme = process.env.MIXWRIGHT_THEME_CSS ?? fileURLToPath(new URL('../../../src/index.css', import.meta.url));
  const server = await createServer({
    configFile: false,
    root: fileURLToPath(new URL('.', options.harness)),
    plugins: [react(), tailwindcss(), harnessPage(options.title)],
    define: options.define,
    resolve: {
      alias: [
        { find: /^mixwright-theme$/, replacement: theme },
        ...Object.entries(aliases).map(([find, replacement]) => ({ find, replacement })),
      ],
    },
    server: { port: 0, strictPort: false, host: '127.0.0.1', fs: { strict: false }, proxy: options.proxy },
    logLevel: 'warn',
  });
  await server.listen();
  const address = server.httpServer?.address();
  const port = typeof address === 'object' && address ? address.port : 5173;
  return { url: `http://127.0.0.1:${port}`, close: () => server.close() };
}

/**
 * Shoots each query on the command line (`shoot.ts out-dir query…`) at 1366×768 and prints each
 * file written; FULL=1 shoots the whole page, DPR=2 doubles the pixels.
 */
export async function shootHarness(options: ShootOptions): Promise<void> {
  const [outDir = '/tmp/mixwright-shots', ...queries] = process.argv.slice(2);
  const server = await startHarnessServer(options);
  const browser = await openBrowser({ width: 1366, height: 768, deviceScaleFactor: Number(process.env.DPR ?? 1) });
  try {
    const { page } = browser;
    page.on('console', (m) => m.type() === 'error' && console.error('page:', m.text()));
    page.on('pageerror', (e) => console.error('page error:', e.message));
    await options.prepare?.(page);
    for (const [i, query] of (queries.length ? queries : [options.defaultQuery ?? '']).entries()) {
      await page.goto(`${server.url}/?${query}`);
      await page.waitForTimeout(options.settleMs);
      const shot: Shot = {
        page,
        query,
        params: new URLSearchParams(query),
        name: `${String(i).padStart(2, '0')}-${query.replace(/[^a-z0-9]+/gi, '_') || 'all'}`,
        outDir,
      };
      await options.beforeShot?.(shot);
      const file = join(outDir, `${shot.name}.png`);
      await page.screenshot({ path: file, fullPage: process.env.FULL === '1' });
      console.log(file);
      await options.afterShot?.(shot);
    }
  } finally {
    await browser.close();
    await server.close();
  }
}
