import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, rename, rm } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { basename, join } from 'node:path';
import { ARDUINO_IDE_VERSION, F_CPU, type AvrBuildTarget } from './avr-boards';
import { runLimited, runTool } from './run-tool';
import { toolchainPaths, type ToolchainOptions } from './toolchain-paths';

/** Flags every file of a build shares: target, defines and the size options. */
export function avrCommonFlags(target: AvrBuildTarget): string[] {
  return [
    `-mmcu=${target.mcu}`,
    `-DF_CPU=${F_CPU}`,
    `-DARDUINO=${ARDUINO_IDE_VERSION}`,
    `-D${target.boardDefine}`,
    '-DARDUINO_ARCH_AVR',
    // gcc-avr 5.4 defines DECIMAL_DIG for C only; the core's WString.cpp needs it in C++.
    '-DDECIMAL_DIG=__DECIMAL_DIG__',
    '-Os',
    '-flto',
    '-ffunction-sections',
    '-fdata-sections',
    // With LTO, identical-code folding merged a PROGMEM table into an equal RAM table.
    '-fno-ipa-icf',
  ];
}

export const AVR_CXX_FLAGS = ['-std=gnu++11', '-fno-exceptions', '-fno-threadsafe-statics', '-fno-fat-lto-objects'];
export const AVR_C_FLAGS = ['-std=gnu11', '-fno-fat-lto-objects'];

export function avrIncludeFlags(target: AvrBuildTarget, options: ToolchainOptions = {}): string[] {
  const { coreRoot } = toolchainPaths(options);
  return [`-I${join(coreRoot, 'cores', 'arduino')}`, `-I${join(coreRoot, 'variants', target.variant)}`];
}

/** Flags for compiling one source file of the core or a library (not our code: warnings off). */
function flagsFor(file: string, target: AvrBuildTarget, includes: string[]): string[] {
  const common = [...avrCommonFlags(target), ...includes, '-w', '-c'];
  if (file.endsWith('.S')) return [...common, '-x', 'assembler-with-cpp'];
  if (file.endsWith('.c')) return [...common, ...AVR_C_FLAGS];
  return [...common, ...AVR_CXX_FLAGS];
}

const building = new Map<string, Promise<string>>();

/**
 * Builds a folder of core or library sources once per board and flag set into an archive,
 * cached under the git-ignored cache folder. Parallel builders (other test workers) race
 * safely: each builds in its own temporary folder and renames it into place.
 */
export function cachedArchive(
  name: string,
  sourceDirs: string[],
  target: AvrBuildTarget,
  extraIncludes: string[] = [],
  options: ToolchainOptions = {},
): Promise<string> {
  const { cacheRoot } = toolchainPaths(options);
  const includes = [...avrIncludeFlags(target, options), ...extraIncludes];
  const key = createHash('sha256')
    .update(JSON.stringify({ name, sourceDirs, flags: flagsFor('x.cpp', target, includes), version: 2 }))
    .digest('hex')
    .slice(0, 16);
  const finalDir = join(cacheRoot, 'avr', `${target.board}-${name}-${key}`);
  const archive = join(finalDir, `lib${name}.a`);
  const pending = building.get(archive);
  if (pending) return pending;
  const job = existsSync(archive)
    ? Promise.resolve(archive)
    : buildArchive(name, sourceDirs, target, includes, finalDir, options).then(() => archive);
  building.set(archive, job);
  job.catch(() => building.delete(archive));
  return job;
}

async function buildArchive(
  name: string,
  sourceDirs: string[],
  target: AvrBuildTarget,
  includes: string[],
  finalDir: string,
  options: ToolchainOptions,
): Promise<void> {
  const { cacheRoot } = toolchainPaths(options);
  await mkdir(join(cacheRoot, 'avr'), { recursive: true });
  const work = await mkdtemp(join(cacheRoot, 'avr', `.build-${name}-`));
  try {
    const sources: string[] = [];
    for (const dir of sourceDirs) {
      for (const entry of await readdir(dir)) if (/\.(c|cpp|S)$/.test(entry)) sources.push(join(dir, entry));
    }
    const objects = sources.map((source, i) => join(work, `${i}-${basename(source)}.o`));
    const results = await runLimited(
      sources.map(
        (source, i) => () =>
          runTool('avr-gcc', [...flagsFor(source, target, includes), source, '-o', objects[i]], { timeoutMs: 120_000 }),
      ),
      availableParallelism(),
    );
    const failed = results.find((r) => r.code !== 0);
    if (failed) throw new Error(`Building ${name} for ${target.board} failed:\n${failed.stderr}`);
    const ar = await runTool('avr-gcc-ar', ['rcs', join(work, `lib${name}.a`), ...objects], { timeoutMs: 60_000 });
    if (ar.code !== 0) throw new Error(`Archiving ${name} failed:\n${ar.stderr}`);
    try {
      await rename(work, finalDir);
    } catch (error) {
      // Another worker finished first; its archive is the same.
      if (!existsSync(join(finalDir, `lib${name}.a`))) throw error;
    }
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

/** The Arduino core for one board, built once. */
export function cachedCore(target: AvrBuildTarget, options: ToolchainOptions = {}): Promise<string> {
  const { coreRoot } = toolchainPaths(options);
  return cachedArchive('core', [join(coreRoot, 'cores', 'arduino')], target, [], options);
}

/** A library bundled with the core (SPI, Wire, EEPROM …), built once per board. */
export function cachedLibrary(
  library: string,
  target: AvrBuildTarget,
  options: ToolchainOptions = {},
): Promise<string> {
  const { coreRoot } = toolchainPaths(options);
  const src = join(coreRoot, 'libraries', library, 'src');
  return cachedArchive(`lib-${library}`, [src], target, [`-I${src}`], options);
}
