import { createHash } from 'node:crypto';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import type { BoardId } from '@shared/schemas/ids';
import type { SketchCheck, VerifyResult } from '@shared/schemas/firmware';
import { getBoard } from '@shared/boards/boards';
import type { BundleFile } from './render-bundle';
import { AVR_TARGETS } from './toolchain/avr-boards';
import { compileAvrSketch } from './toolchain/avr-compile';
import { toolchainPaths, type ToolchainOptions } from './toolchain/toolchain-paths';

export type { SketchCheck, VerifyResult };

export interface VerifyOptions extends ToolchainOptions {
  /** Per compiler, linker or size step. */
  timeoutMs?: number;
}

const cache = new Map<string, Promise<VerifyResult>>();
const CACHE_LIMIT = 64;

/** SHA-256 over every file's path and content, in path order: equal bundles, equal hash. */
export function bundleHash(files: BundleFile[]): string {
  const hash = createHash('sha256');
  for (const f of [...files].sort((a, b) => (a.path < b.path ? -1 : 1))) hash.update(`${f.path}\0${f.content}\0`);
  return hash.digest('hex');
}

/** Which board each sketch folder targets, from the bundle's own config.json. */
function sketchBoards(files: BundleFile[]): { folder: string; board: BoardId }[] {
  const configFile = files.find((f) => f.path === 'config.json');
  if (!configFile) throw new Error('The bundle has no config.json');
  const config = RobotConfigSchema.parse(JSON.parse(configFile.content));
  const folders = files
    .map((f) => f.path.split('/'))
    .filter((p) => p.length === 2 && p[1] === `${p[0]}.ino`)
    .map((p) => p[0]);
  return folders.map((folder) => ({
    folder,
    board: folder.endsWith('_remote') ? config.controls.link.remoteBoard : config.wiring.board,
  }));
}

/** Only sketch sources, only inside their folder: nothing else from the bundle reaches the disk. */
function sketchSources(files: BundleFile[], folder: string): BundleFile[] {
  return files.filter((f) => {
    const parts = f.path.split('/');
    return (
      parts.length === 2 &&
      parts[0] === folder &&
      /^[A-Za-z0-9_.-]+\.(ino|h)$/.test(parts[1]) &&
      !parts[1].startsWith('.')
    );
  });
}

async function checkSketch(
  files: BundleFile[],
  folder: string,
  board: BoardId,
  options: VerifyOptions,
): Promise<SketchCheck> {
  if (!AVR_TARGETS[board]) {
    return {
      folder,
      board,
      ok: null,
      messages: `No compiler for ${getBoard(board).name} on this server; only AVR boards are compiled here.`,
    };
  }
  const { cacheRoot } = toolchainPaths(options);
  await mkdir(cacheRoot, { recursive: true });
  const root = await mkdtemp(join(cacheRoot, '.verify-'));
  try {
    for (const file of sketchSources(files, folder)) {
      const path = join(root, file.path);
      await mkdir(dirname(path), { recursive: true });
      await writeFile(path, file.content);
    }
    const result = await compileAvrSketch(join(root, folder), board, options);
    if (!result.ok)
      return {
        folder,
        board,
        ok: false,
        messages: result.messages,
        ...(result.stage === 'timeout' ? { timedOut: true } : {}),
      };
    const { flashBytes, flashMax, ramBytes, ramMax } = result;
    return { folder, board, ok: true, flashBytes, flashMax, ramBytes, ramMax };
  } finally {
    await rm(root, { recursive: true, force: true });
  }
}

/** The check of a bundle already done (or under way), without starting one. */
export function cachedVerifyResult(files: BundleFile[]): Promise<VerifyResult> | undefined {
  return cache.get(bundleHash(files));
}

/**
 * Compiles every sketch of a rendered bundle where this machine has the toolchain (AVR
 * boards), reporting flash and RAM use or the compiler's messages. Results are cached by the
 * bundle's content hash, so checking the same revision twice costs nothing.
 */
export function verifyBundle(files: BundleFile[], options: VerifyOptions = {}): Promise<VerifyResult> {
  const hash = bundleHash(files);
  const cached = cache.get(hash);
  if (cached) return cached;
  const job = (async () => {
    const sketches: SketchCheck[] = [];
    for (const { folder, board } of sketchBoards(files))
      sketches.push(await checkSketch(files, folder, board, options));
    return { hash, sketches };
  })();
  cache.set(hash, job);
  // A check stopped at its time limit says nothing about the code: the next request tries again.
  job.then(
    (result) => result.sketches.some((s) => s.timedOut) && cache.delete(hash),
    () => cache.delete(hash),
  );
  if (cache.size > CACHE_LIMIT) cache.delete(cache.keys().next().value!);
  return job;
}
