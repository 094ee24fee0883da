import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { linkPacketTemplateData } from '@server/features/firmware/link-packet';
import { runTool } from '@server/features/firmware/toolchain/run-tool';
import { testDir } from './temp-dirs';
import { renderTemplate } from '@server/features/firmware/templates';

export const TEST_META = { generatorVersion: 'test', revision: 0, hash: '00000000' };

/** Renders the decoder headers (which need no robot) into a fresh folder. */
export async function renderDecoderHeaders(): Promise<string> {
  const dir = await testDir('host-');
  const data = { meta: TEST_META, packet: linkPacketTemplateData() };
  for (const name of [
    'mw_frame.h',
    'mw_sbus.h',
    'mw_ibus.h',
    'mw_ppm.h',
    'mw_rc_pulse.h',
    'mw_nrf24.h',
    'mw_link_packet.h',
  ]) {
    await writeFile(join(dir, name), renderTemplate(`common/${name}`, data));
  }
  return dir;
}

/** Compiles a host C++ program against the headers in `includeDir` with warnings as errors. */
export async function compileHostProgram(source: string, includeDir: string, std = 'c++11'): Promise<string> {
  const binary = join(includeDir, 'probe');
  const result = await runTool(
    'g++',
    [`-std=${std}`, '-Wall', '-Wextra', '-Werror', '-O1', `-I${includeDir}`, source, '-o', binary],
    {
      timeoutMs: 120_000,
    },
  );
  if (result.code !== 0) throw new Error(`Host compile failed:\n${result.stderr}`);
  return binary;
}

/** Runs a probe with commands on stdin and returns one parsed JSON object per output line. */
export async function runProbe<T = Record<string, unknown>>(binary: string, lines: string[]): Promise<T[]> {
  const result = await runTool(binary, [], { input: `${lines.join('\n')}\n`, timeoutMs: 30_000 });
  if (result.code !== 0) throw new Error(`Probe failed (${result.code}):\n${result.stderr}`);
  return result.stdout
    .split('\n')
    .filter((l) => l.trim())
    .map((l) => JSON.parse(l) as T);
}

export const hex = (bytes: ArrayLike<number>) => Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join(' ');
