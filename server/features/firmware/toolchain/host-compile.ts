import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { basename, join, resolve } from 'node:path';
import { STRICT_WARNINGS } from './avr-compile';
import { runTool } from './run-tool';
import { toolchainPaths, type ToolchainOptions } from './toolchain-paths';

export interface HostCompileOptions extends ToolchainOptions {
  /** Folder of headers standing in for the board's core (Arduino.h, SPI.h …). */
  stubDir: string;
  timeoutMs?: number;
  defines?: string[];
}

export type HostCompileResult = { ok: true } | { ok: false; messages: string };

/**
 * Compiles a sketch folder with the host's g++ against stub headers of a core's documented
 * API (for boards whose compiler this machine lacks). It proves the generated code is valid
 * C++ for those signatures with warnings as errors; it does not build for the real board.
 */
export async function compileWithStubs(sketchDir: string, options: HostCompileOptions): Promise<HostCompileResult> {
  const dir = resolve(sketchDir);
  const main = `${basename(dir)}.ino`;
  const entries = await readdir(dir);
  if (!entries.includes(main)) throw new Error(`The sketch folder ${basename(dir)} has no ${main}`);
  const work = await mkdtemp(join(toolchainPaths(options).cacheRoot, '.host-'));
  try {
    const args = [
      '-std=gnu++17',
      ...STRICT_WARNINGS,
      '-Os',
      `-I${dir}`,
      `-I${resolve(options.stubDir)}`,
      ...(options.defines ?? []).map((d) => `-D${d}`),
      '-x',
      'c++',
      '-include',
      'Arduino.h',
      '-c',
      join(dir, main),
      '-o',
      join(work, 'sketch.o'),
    ];
    const result = await runTool('g++', args, { timeoutMs: options.timeoutMs ?? 120_000 });
    if (result.timedOut) return { ok: false, messages: 'The compile step took too long and was stopped.' };
    if (result.code !== 0) return { ok: false, messages: result.stderr.split(dir).join(basename(dir)).trim() };
    return { ok: true };
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}
