import { mkdir, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { BundleFile } from '@server/features/firmware/render-bundle';
import { testDir } from './temp-dirs';

/** Writes bundle files into a fresh folder under the git-ignored cache and returns it. */
export async function writeBundle(files: BundleFile[], prefix = 'bundle-'): Promise<string> {
  const root = await testDir(prefix);
  for (const file of files) {
    const path = join(root, file.path);
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, file.content);
  }
  return root;
}

/** The sketch folders in a bundle (folders holding `<folder>/<folder>.ino`). */
export function sketchFolders(files: BundleFile[]): string[] {
  return files
    .map((f) => f.path.split('/'))
    .filter((parts) => parts.length === 2 && parts[1] === `${parts[0]}.ino`)
    .map((parts) => parts[0]);
}
