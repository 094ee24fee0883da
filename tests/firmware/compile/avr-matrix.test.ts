import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DRIVE_LAYOUT_IDS, DRIVER_KIND_IDS, INPUT_SOURCE_IDS } from '@shared/schemas/ids';
import { renderBundle } from '@server/features/firmware/render-bundle';
import { compileAvrSketch, type AvrCompileResult } from '@server/features/firmware/toolchain/avr-compile';
import { runLimited } from '@server/features/firmware/toolchain/run-tool';
import { sketchFolders, writeBundle } from '../helpers/bundle-files';
import { matrixCases } from './matrix-cases';

// Every starter layout × every input source × Uno, Nano and Mega that the pin plan can satisfy,
// generated and compiled with Debian's avr-gcc against the Arduino AVR core, -Wall -Wextra
// -Werror on every generated file (the remote's transmitter sketch too).

const cases = matrixCases(['uno', 'nano', 'mega2560']);
const placed = cases.filter((c) => c.config !== null);

let builds: Promise<Map<string, { folder: string; result: AvrCompileResult }[]>> | undefined;

/** Compiles every placed case once, in parallel, the first time a test asks. */
function compileAll() {
  builds ??= (async () => {
    const jobs = placed.flatMap((c) => {
      const files = renderBundle(c.config!, { revision: 1 });
      const written = writeBundle(files, 'matrix-');
      return sketchFolders(files).map((folder) => async () => {
        const board = folder.endsWith('_remote') ? c.config!.controls.link.remoteBoard : c.board;
        return { name: c.name, folder, result: await compileAvrSketch(join(await written, folder), board) };
      });
    });
    const results = await runLimited(jobs, availableParallelism());
    const byCase = new Map<string, { folder: string; result: AvrCompileResult }[]>();
    for (const r of results)
      byCase.set(r.name, [...(byCase.get(r.name) ?? []), { folder: r.folder, result: r.result }]);
    return byCase;
  })();
  return builds;
}

describe('the AVR compile matrix', () => {
  it('has a board the pin plan can satisfy for every layout and input, and uses every driver kind', () => {
    for (const layout of DRIVE_LAYOUT_IDS) {
      for (const input of INPUT_SOURCE_IDS)
        expect(
          placed.some((c) => c.layout === layout && c.input === input),
          `${layout} / ${input}`,
        ).toBe(true);
    }
    expect(new Set(placed.map((c) => c.driver))).toEqual(new Set(DRIVER_KIND_IDS));
  });

  it('gives a reason for every combination the pin plan refuses', () => {
    for (const c of cases.filter((x) => x.config === null)) expect(c.refusal, c.name).toMatch(/\w/);
  });

  it.each(placed.map((c) => [c.name]))('compiles %s', async (name) => {
    const results = (await compileAll()).get(name)!;
    expect(results.length).toBeGreaterThan(0);
    for (const { folder, result } of results) {
      expect(result.ok ? 'compiled' : `${folder}:\n${result.messages}`).toBe('compiled');
      if (result.ok) expect(result.flashBytes).toBeLessThan(result.flashMax);
    }
  });
});
