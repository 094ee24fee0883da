import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// `npm start` is what the README tells everyone to run, on laptops in clubs and classrooms: it
// must serve only the built client and the API, and only to this machine unless told otherwise.

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

/** Local addresses (hex `address:port`) of listening TCP sockets on `port`, from the kernel's table. */
function listeningAddresses(port: number): string[] {
  const portHex = port.toString(16).toUpperCase().padStart(4, '0');
  return ['/proc/net/tcp', '/proc/net/tcp6'].flatMap((table) =>
    readFileSync(table, 'utf8')
      .split('\n')
      .slice(1)
      .map((line) => line.trim().split(/\s+/))
      .filter((cols) => cols[1]?.endsWith(`:${portHex}`) && cols[3] === '0A')
      .map((cols) => cols[1]),
  );
}

let server: ChildProcess;
let dir: string;
let port: number;
let output = '';
const url = (path: string) => `http://127.0.0.1:${port}${path}`;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'mixwright-start-'));
  port = await freePort();
  const env: NodeJS.ProcessEnv = { ...process.env, PORT: String(port), DATA_DIR: dir };
  env.DATABASE_PATH = join(dir, 'mixwright.sqlite');
  for (const name of ['NODE_ENV', 'HOST', 'SMTP_URL', 'APP_URL', 'TRUST_PROXY']) delete env[name];
  server = spawn('npm', ['start'], { env, stdio: ['ignore', 'pipe', 'pipe'], detached: true });
  await new Promise<void>((resolve, reject) => {
    const read = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes(' is at ')) resolve();
    };
    server.stdout!.on('data', read);
    server.stderr!.on('data', read);
    server.once('exit', (code) => reject(new Error(`npm start exited with ${code}:\n${output}`)));
  });
}, 600_000);

afterAll(async () => {
  if (server?.pid && server.exitCode === null) {
    const exited = new Promise((resolve) => server.once('exit', resolve));
    process.kill(-server.pid, 'SIGTERM');
    await exited;
  }
  rmSync(dir, { recursive: true, force: true });
});

describe('the main command', () => {
  it('listens on this machine only', () => {
    // 0100007F is 127.0.0.1 as the kernel prints it (little-endian hex).
    expect(listeningAddresses(port)).toEqual([`0100007F:${port.toString(16).toUpperCase().padStart(4, '0')}`]);
  });

  it('serves the built client, not the development server', async () => {
    const page = await fetch(url('/teams'));
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toMatch(/<script type="module" crossorigin src="\/assets\/[^"]+\.js">/);
    expect(html).not.toContain('/@vite/client');
    const viteClient = await (await fetch(url('/@vite/client'))).text();
    expect(viteClient).not.toContain('createHotContext');
  });

  it('does not serve the database, source files or tests', async () => {
    const paths = [
      '/data/mixwright.sqlite',
      '/data/mixwright.sqlite-wal',
      `/@fs${join(dir, 'mixwright.sqlite')}`,
      '/src/main.tsx',
      '/server/app.ts',
      '/tests/api/support/test-app.ts',
      '/package.json',
    ];
    for (const path of paths) {
      const response = await fetch(url(path));
      const body = await response.text();
      expect({ path, status: response.status }).toEqual({ path, status: 404 });
      expect(body).not.toMatch(/SQLite format 3|createApp|import /);
    }
  });

  it('keeps the local mailbox for this machine only', async () => {
    expect((await fetch(url('/dev/mailbox'))).status).toBe(200);
    const fromNetwork = await fetch(url('/api/dev/mailbox'), { headers: { 'X-Forwarded-For': '192.0.2.4' } });
    expect(fromNetwork.status).toBe(403);
  });
});
