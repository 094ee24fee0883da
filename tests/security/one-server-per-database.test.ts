import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { acquireDatabaseLock } from '@server/db/database-lock';

// Two servers writing one SQLite file trip over each other's snapshots and answer 500s. A
// second server on the same file must refuse to start, and say why.

const dir = mkdtempSync(join(tmpdir(), 'mixwright-lock-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs the real server entry with this database; resolves with its exit code and output. */
function startServer(databasePath: string): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve) => {
    const env = { ...process.env, DATABASE_PATH: databasePath, DATA_DIR: dir, PORT: '0' };
    const child = spawn('npx', ['tsx', 'server/index.ts'], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.on('exit', (code) => resolve({ code, output }));
  });
}

describe('a second server on the same database file', { timeout: 120_000 }, () => {
  it('refuses to start and names the server already using it', async () => {
    const databasePath = join(dir, 'shared.sqlite');
    const lock = acquireDatabaseLock(databasePath);
    try {
      const second = await startServer(databasePath);
      expect(second.code).toBe(1);
      expect(second.output).toContain(
        `Another Mixwright server (process ${process.pid}) is already using ${databasePath}`,
      );
    } finally {
      lock.release();
    }
  });

  it('is refused within one process too', () => {
    const databasePath = join(dir, 'again.sqlite');
    writeFileSync(`${databasePath}.lock`, JSON.stringify({ pid: process.ppid }));
    expect(() => acquireDatabaseLock(databasePath)).toThrow(/Another Mixwright server/);
  });
});

describe('the database lock', () => {
  it('is taken over from a server that is no longer running', () => {
    const databasePath = join(dir, 'stale.sqlite');
    const gone = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))']).stdout.toString();
    writeFileSync(`${databasePath}.lock`, JSON.stringify({ pid: Number(gone) }));
    const lock = acquireDatabaseLock(databasePath);
    lock.release();
    expect(existsSync(`${databasePath}.lock`)).toBe(false);
  });
});
