import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { basename, join, resolve } from 'node:path';
import type { BoardId } from '@shared/schemas/ids';
import { avrTarget, type AvrBuildTarget } from './avr-boards';
import {
  AVR_CXX_FLAGS,
  AVR_C_FLAGS,
  avrCommonFlags,
  avrIncludeFlags,
  cachedCore,
  cachedLibrary,
} from './avr-core-cache';
import { runTool, type ToolResult } from './run-tool';
import { toolchainPaths, type ToolchainOptions } from './toolchain-paths';

/** Warnings are errors in our own (generated) code. */
export const STRICT_WARNINGS = ['-Wall', '-Wextra', '-Werror'];

export interface AvrCompileOptions extends ToolchainOptions {
  /** Time limit for each compiler, linker or size step. */
  timeoutMs?: number;
  /** Extra `-D` defines (for test builds), as `NAME` or `NAME=value`. */
  defines?: string[];
  /** Keep the build here (ELF and HEX); otherwise a temporary folder is removed afterwards. */
  outDir?: string;
}

export type AvrCompileResult =
  | {
      ok: true;
      board: BoardId;
      flashBytes: number;
      ramBytes: number;
      flashMax: number;
      ramMax: number;
      /** Present when `outDir` was given. */
      elfPath?: string;
      hexPath?: string;
    }
  | { ok: false; board: BoardId; stage: 'compile' | 'link' | 'timeout'; messages: string };

/**
 * Compiles an Arduino sketch folder (`name/name.ino` plus headers and any `.c`/`.cpp`)
 * against the Arduino AVR core the way the IDE would, but with warnings as errors on
 * the sketch's own files, then links and measures flash and RAM use.
 */
export async function compileAvrSketch(
  sketchDir: string,
  board: BoardId,
  options: AvrCompileOptions = {},
): Promise<AvrCompileResult> {
  const target = avrTarget(board);
  const dir = resolve(sketchDir);
  const timeoutMs = options.timeoutMs ?? 120_000;
  const { cacheRoot } = toolchainPaths(options);
  const sources = await sketchSources(dir);
  const libraries = await librariesUsed(dir, sources, options);
  const [core, ...libArchives] = await Promise.all([
    cachedCore(target, options),
    ...libraries.map((lib) => cachedLibrary(lib, target, options)),
  ]);
  await mkdir(cacheRoot, { recursive: true });
  const work = options.outDir ? resolve(options.outDir) : await mkdtemp(join(cacheRoot, '.sketch-'));
  await mkdir(work, { recursive: true });
  const clean = (text: string) => text.split(dir).join(basename(dir)).split(work).join('build');
  try {
    const includes = [
      `-I${dir}`,
      ...avrIncludeFlags(target, options),
      ...libraries.map((lib) => `-I${libraryDir(lib, options)}`),
      ...(options.defines ?? []).map((d) => `-D${d}`),
    ];
    const objects: string[] = [];
    for (const source of sources) {
      const object = join(work, `${basename(source)}.o`);
      objects.push(object);
      const result = await runTool(
        'avr-gcc',
        [...sourceFlags(source, target), ...includes, '-c', source, '-o', object],
        {
          timeoutMs,
        },
      );
      const failure = stepFailure(result, 'compile', board, clean);
      if (failure) return failure;
    }
    const elf = join(work, 'firmware.elf');
    const link = await runTool(
      'avr-gcc',
      [
        ...avrCommonFlags(target),
        '-fuse-linker-plugin',
        '-Wl,--gc-sections',
        '-o',
        elf,
        ...objects,
        ...libArchives,
        core,
        '-lm',
      ],
      { timeoutMs },
    );
    const linkFailure = stepFailure(link, 'link', board, clean);
    if (linkFailure) return linkFailure;
    const hex = join(work, 'firmware.hex');
    const copy = await runTool('avr-objcopy', ['-O', 'ihex', '-R', '.eeprom', elf, hex], { timeoutMs });
    const copyFailure = stepFailure(copy, 'link', board, clean);
    if (copyFailure) return copyFailure;
    const size = await runTool('avr-size', ['-A', elf], { timeoutMs });
    const sizeFailure = stepFailure(size, 'link', board, clean);
    if (sizeFailure) return sizeFailure;
    const sections = parseSizeOutput(size.stdout);
    return {
      ok: true,
      board,
      flashBytes: sections.text + sections.data,
      ramBytes: sections.data + sections.bss,
      flashMax: target.flashMax,
      ramMax: target.ramMax,
      ...(options.outDir ? { elfPath: elf, hexPath: hex } : {}),
    };
  } finally {
    if (!options.outDir) await rm(work, { recursive: true, force: true });
  }
}

function stepFailure(
  result: ToolResult,
  stage: 'compile' | 'link',
  board: BoardId,
  clean: (text: string) => string,
): AvrCompileResult | null {
  if (result.timedOut)
    return { ok: false, board, stage: 'timeout', messages: `The ${stage} step took too long and was stopped.` };
  if (result.code === 0) return null;
  return { ok: false, board, stage, messages: clean(`${result.stderr}${result.stdout}`).trim() };
}

function sourceFlags(source: string, target: AvrBuildTarget): string[] {
  const common = [...avrCommonFlags(target), ...STRICT_WARNINGS];
  if (source.endsWith('.ino')) return [...common, ...AVR_CXX_FLAGS, '-x', 'c++', '-include', 'Arduino.h'];
  if (source.endsWith('.c')) return [...common, ...AVR_C_FLAGS];
  return [...common, ...AVR_CXX_FLAGS];
}

/** The main `.ino` (named after the folder, as the Arduino IDE requires) and any `.c`/`.cpp`. */
async function sketchSources(dir: string): Promise<string[]> {
  const entries = await readdir(dir);
  const main = `${basename(dir)}.ino`;
  if (!entries.includes(main)) throw new Error(`The sketch folder ${basename(dir)} has no ${main}`);
  const others = entries.filter((e) => /\.(c|cpp)$/.test(e)).sort();
  return [join(dir, main), ...others.map((e) => join(dir, e))];
}

function libraryDir(library: string, options: ToolchainOptions): string {
  return join(toolchainPaths(options).coreRoot, 'libraries', library, 'src');
}

/** Libraries bundled with the core that the sketch includes (`#include <SPI.h>`). */
async function librariesUsed(dir: string, sources: string[], options: ToolchainOptions): Promise<string[]> {
  const headers = (await readdir(dir)).filter((e) => e.endsWith('.h')).map((e) => join(dir, e));
  const found = new Set<string>();
  for (const file of [...sources, ...headers]) {
    const text = await readFile(file, 'utf8');
    for (const match of text.matchAll(/^\s*#\s*include\s*<([A-Za-z0-9_]+)\.h>/gm)) {
      if (existsSync(join(libraryDir(match[1], options), `${match[1]}.h`))) found.add(match[1]);
    }
  }
  return [...found].sort();
}

/** `avr-size -A` prints one line per section: name, size, address. */
export function parseSizeOutput(text: string): { text: number; data: number; bss: number } {
  const size = (name: string) => {
    const match = new RegExp(`^\\.${name}\\s+(\\d+)`, 'm').exec(text);
    return match ? Number(match[1]) : 0;
  };
  return { text: size('text'), data: size('data'), bss: size('bss') };
}
