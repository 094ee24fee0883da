import { existsSync, realpathSync } from 'node:fs';
import type { Server } from 'node:http';
import { join, resolve } from 'node:path';
import express, { type RequestHandler } from 'express';

export interface ClientHandlers {
  handlers: RequestHandler[];
  close: () => Promise<void>;
}

/** Development: Vite compiles the client on request and pushes updates over the same port. */
export async function viteClient(httpServer: Server): Promise<ClientHandlers> {
  const { createServer, searchForWorkspaceRoot } = await import('vite');
  // node_modules may be a link to a shared folder; fonts are served from it.
  const allow = [searchForWorkspaceRoot(process.cwd()), realpathSync('node_modules')];
  const vite = await createServer({
    server: { middlewareMode: true, hmr: { server: httpServer }, fs: { allow } },
    appType: 'spa',
  });
  return { handlers: [vite.middlewares], close: () => vite.close() };
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
    // The page itself is never cached, so a new build is picked up; hashed assets may be.
    res.set('Cache-Control', 'no-cache');
    res.sendFile('index.html', { root });
  };
  return {
    handlers: [express.static(root, { index: false, maxAge: '1h' }), fallback],
    close: async () => {},
  };
}
