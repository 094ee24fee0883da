import { existsSync } from 'node:fs';
import type { Server } from 'node:http';
import { join, resolve } from 'node:path';
import express, { type RequestHandler } from 'express';
import { devFileGuard, devFileRules } from './dev-file-guard';
import { HttpError } from './lib/http-error';

export interface ClientHandlers {
  handlers: RequestHandler[];
  close: () => Promise<void>;
}

/**
 * Development: Vite compiles the client on request and pushes updates over the same port. It
 * may read only the client's own folders (and the installed packages, which may be a link to a
 * shared folder); a guard in front of it refuses every other path, the data folder and the
 * database included, wherever they are.
 */
export async function viteClient(
  httpServer: Server,
  data: { dataDir: string; databasePath: string },
  root = process.cwd(),
): Promise<ClientHandlers> {
  const { createServer } = await import('vite');
  const rules = devFileRules({ root, ...data });
  const vite = await createServer({
    root: rules.root,
    configFile: join(rules.root, 'vite.config.ts'),
    server: {
      middlewareMode: true,
      hmr: { server: httpServer },
      fs: {
        strict: true,
        allow: rules.allowed,
        deny: ['.env', '.env.*', '*.{crt,pem}', '**/.git/**', '**/*.{sqlite,sqlite3,db}', '**/*.{sqlite,sqlite3,db}-*'],
      },
    },
    appType: 'spa',
  });
  return { handlers: [devFileGuard(rules), vite.middlewares], close: () => vite.close() };
}

/** Production and browser tests: the built client, with every other path answered by index.html. */
export function staticClient(dir: string): ClientHandlers {
  const root = resolve(dir);
  const index = join(root, 'index.html');
  if (!existsSync(index)) {
    throw new Error(`No built client at ${root}; run \`npm run build\` first`);
  }
  const fallback: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    // Pages have no file extension; a missing file (`/data/x.sqlite`) is not found, not the page.
    if (/\.[^/]*$/.test(req.path)) return next(new HttpError(404, 'Not found'));
    // The page itself is never cached, so a new build is picked up; hashed assets may be.
    res.set('Cache-Control', 'no-cache');
    res.sendFile('index.html', { root });
  };
  return {
    handlers: [express.static(root, { index: false, maxAge: '1h' }), fallback],
    close: async () => {},
  };
}
