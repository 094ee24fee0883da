import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { httpRequest } from './http';

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** Ends the server the hard way: the whole process, no chance to finish anything. */
  killHard: () => Promise<void>;
  /** Ends the server as Ctrl-C would. */
  stop: () => Promise<void>;
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

const exited = (child: ChildProcess) =>
  new Promise<void>((resolve) =>
    child.exitCode !== null || child.signalCode !== null ? resolve() : child.once('exit', () => resolve()),
  );

/**
 * Starts `server/index.ts` in production mode (one node process, so a kill reaches the server
 * itself) and waits until it answers. Its output goes to `server.log` in `dir`.
 */
export async function startServer(options: {
  dir: string;
  databasePath: string;
  smtpPort: number;
}): Promise<ServerProcess> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    PORT: String(port),
    HOST: '127.0.0.1',
    APP_URL: url,
    DATABASE_PATH: options.databasePath,
    DATA_DIR: options.dir,
    SMTP_URL: `smtp://127.0.0.1:${options.smtpPort}`,
  };
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const log = createWriteStream(join(options.dir, 'server.log'), { flags: 'a' });
  child.stdout!.pipe(log, { end: false });
  child.stderr!.pipe(log, { end: false });
  let ended = false;
  child.once('exit', () => (ended = true));
  // Ready when it answers at all; a fresh start may build the client first.
  for (;;) {
    if (ended) throw new Error(`The server stopped while starting; see ${join(options.dir, 'server.log')}`);
    try {
      await httpRequest(url, { method: 'GET', path: '/api/auth/me' });
      break;
    } catch {
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
  }
  return {
    url,
    child,
    killHard: async () => {
      child.kill('SIGKILL');
      await exited(child);
    },
    stop: async () => {
      child.kill('SIGTERM');
      await exited(child);
    },
  };
}
