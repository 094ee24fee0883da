import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { getBoard } from '@shared/boards/boards';
import { renderBundle } from '@server/features/firmware/render-bundle';
import { compileWithStubs, type HostCompileResult } from '@server/features/firmware/toolchain/host-compile';
import { runLimited } from '@server/features/firmware/toolchain/run-tool';
import { sketchFolders, writeBundle } from '../helpers/bundle-files';
import { matrixCases } from './matrix-cases';

// ESP32 and RP2040 bundles, every starter layout × every input source the pin plan places,
// compiled with the host's g++ (-Wall -Wextra -Werror) against OUR STUB HEADERS of the
// documented core APIs (tests/firmware/stubs): Arduino ESP32 core 3.x and Arduino-Pico.
// This checks the generated C++ against those signatures only; it is not a build with the
// vendor cores, which are not installed here.

const STUBS = fileURLToPath(new URL('../stubs/', import.meta.url));
const placed = matrixCases(['esp32-devkitc', 'rp2040-pico']).filter((c) => c.config !== null);

let builds: Promise<Map<string, HostCompileResult>> | undefined;

function compileAll() {
  builds ??= (async () => {
    const jobs = placed.map((c) => async () => {
      const files = renderBundle(c.config!, { revision: 1 });
      const root = await writeBundle(files, 'stub-');
      const folder = sketchFolders(files).find((f) => !f.endsWith('_remote'))!;
      const stubDir = join(STUBS, getBoard(c.board).family);
      return [c.name, await compileWithStubs(join(root, folder), { stubDir })] as const;
    });
    return new Map(await runLimited(jobs, availableParallelism()));
  })();
  return builds;
}

describe('ESP32 and RP2040 bundles against stubs of the documented core APIs (not the vendor cores)', () => {
  it('cover every layout and input on both boards', () => {
    expect(placed.filter((c) => c.board === 'esp32-devkitc').length).toBe(30);
    expect(placed.filter((c) => c.board === 'rp2040-pico').length).toBe(30);
  });

  it.each(placed.map((c) => [c.name]))('compiles %s against the stub headers', async (name) => {
    const result = (await compileAll()).get(name)!;
    expect(result.ok ? 'compiled' : result.messages).toBe('compiled');
  });
});
