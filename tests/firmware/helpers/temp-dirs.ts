import { readdirSync, rmSync, statSync } from 'node:fs';
import { mkdir, mkdtemp } from 'node:fs/promises';
import { join } from 'node:path';
import { DEFAULT_CACHE_ROOT } from '@server/features/firmware/toolchain/toolchain-paths';

// Test folders (rendered bundles, builds) live under the git-ignored cache and are removed when
// the test process ends; the cached cores and the simulator runner stay. A worker that is
// stopped without exiting leaves its folders, so folders older than two hours go at the next run.
const created: string[] = [];
let hooked = false;
const STALE_MS = 2 * 60 * 60 * 1000;

function removeStale(root: string): void {
  for (const name of readdirSync(root)) {
    const path = join(root, name);
    try {
      if (Date.now() - statSync(path).mtimeMs > STALE_MS) rmSync(path, { recursive: true, force: true });
    } catch {
      // Another test process removed it first.
    }
  }
}

export async function testDir(prefix: string): Promise<string> {
  const root = join(DEFAULT_CACHE_ROOT, 'tmp');
  await mkdir(root, { recursive: true });
  if (!hooked) {
    hooked = true;
    removeStale(root);
    process.once('exit', () => {
      for (const path of created) rmSync(path, { recursive: true, force: true });
    });
  }
  const dir = await mkdtemp(join(root, prefix));
  created.push(dir);
  return dir;
}
