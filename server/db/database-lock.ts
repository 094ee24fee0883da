import { readFileSync, rmSync, writeFileSync } from 'node:fs';

/** Thrown when another running server already uses the database file. */
export class DatabaseInUseError extends Error {
  constructor(databasePath: string, pid: number, lockPath: string) {
    super(
      `Another Mixwright server (process ${pid}) is already using ${databasePath}. Stop it first, or give ` +
        `this one its own DATABASE_PATH. If no such server is running, remove ${lockPath}.`,
    );
    this.name = 'DatabaseInUseError';
  }
}

function isRunning(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: the process exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

function lockOwner(lockPath: string): number | null {
  try {
    const pid = Number((JSON.parse(readFileSync(lockPath, 'utf8')) as { pid?: unknown }).pid);
    return Number.isInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

/**
 * One server per database file. Two servers writing one SQLite file in WAL mode get
 * SQLITE_BUSY_SNAPSHOT when one's read transaction turns into a write after the other wrote,
 * and answer 500; so a second server refuses to start instead. The lock is a file next to the
 * database naming the server's process; a lock left by a process that is gone (killed, or the
 * machine restarted) is taken over.
 */
export function acquireDatabaseLock(databasePath: string): { release: () => void } {
  const lockPath = `${databasePath}.lock`;
  for (let attempt = 0; attempt < 2; attempt += 1) {
    try {
      writeFileSync(lockPath, JSON.stringify({ pid: process.pid, startedAt: new Date().toISOString() }), {
        flag: 'wx',
      });
      return {
        release: () => {
          if (lockOwner(lockPath) === process.pid) rmSync(lockPath, { force: true });
        },
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const owner = lockOwner(lockPath);
      if (owner !== null && owner !== process.pid && isRunning(owner)) {
        throw new DatabaseInUseError(databasePath, owner, lockPath);
      }
      rmSync(lockPath, { force: true });
    }
  }
  throw new Error(`Could not take the lock ${lockPath}`);
}
