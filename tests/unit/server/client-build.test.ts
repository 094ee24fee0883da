import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { clientBuildState } from '@server/client-build';

let root: string;
afterEach(() => rmSync(root, { recursive: true, force: true }));

/** A project with one client source and, when asked, a build made at `builtAt` (seconds). */
function project(options: { builtAt?: number; sourceAt: number }): { outDir: string; source: string } {
  root = mkdtempSync(join(tmpdir(), 'mixwright-build-'));
  mkdirSync(join(root, 'src', 'features'), { recursive: true });
  const source = join(root, 'src', 'features', 'page.tsx');
  writeFileSync(source, 'export {}');
  // Folders count too (a removed file shows only in its folder's time).
  for (const path of [source, join(root, 'src', 'features'), join(root, 'src')]) {
    utimesSync(path, options.sourceAt, options.sourceAt);
  }
  const outDir = join(root, 'dist', 'client');
  if (options.builtAt !== undefined) {
    mkdirSync(outDir, { recursive: true });
    writeFileSync(join(outDir, 'index.html'), '<!doctype html>');
    utimesSync(join(outDir, 'index.html'), options.builtAt, options.builtAt);
  }
  return { outDir, source };
}

describe('whether the client needs building before it is served', () => {
  it('builds when there is no build yet', () => {
    const { outDir } = project({ sourceAt: 1_000 });
    expect(clientBuildState(root, outDir)).toBe('missing');
  });

  it('builds again when a source file changed after the build', () => {
    const { outDir } = project({ sourceAt: 2_000, builtAt: 1_000 });
    expect(clientBuildState(root, outDir)).toBe('stale');
  });

  it('serves the build as it is when it is newer than every source', () => {
    const { outDir } = project({ sourceAt: 1_000, builtAt: 2_000 });
    expect(clientBuildState(root, outDir)).toBe('fresh');
  });
});
