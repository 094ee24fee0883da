import { describe, expect, it } from 'vitest';
import { assignPins } from '@shared/pins/assign-pins';
import { buildStarterConfig } from '@shared/starter';
import { renderBundle, type BundleFile } from '@server/features/firmware/render-bundle';
import { verifyBundle } from '@server/features/firmware/verify-bundle';
import { sampleConfig } from '../../factories/robot-config';

const uno = () => renderBundle(sampleConfig(), { revision: 2 });
const edit = (files: BundleFile[], path: string, change: (text: string) => string) =>
  files.map((f) => (f.path === path ? { ...f, content: change(f.content) } : f));

describe('checking that a bundle compiles', () => {
  it('reports flash and RAM use of an Uno bundle', async () => {
    const result = await verifyBundle(uno());
    expect(result.sketches).toHaveLength(1);
    expect(result.sketches[0]).toMatchObject({
      folder: 'garden_hauler',
      board: 'uno',
      ok: true,
      flashMax: 32256,
      ramMax: 2048,
    });
    expect(result.sketches[0].flashBytes).toBeGreaterThan(1000);
  });

  it("returns the compiler's messages, naming the file, when the code does not compile", async () => {
    const broken = edit(uno(), 'garden_hauler/mw_config.h', (text) => `${text}\nstatic const int broken = ;\n`);
    const [sketch] = (await verifyBundle(broken)).sketches;
    expect(sketch.ok).toBe(false);
    expect(sketch.messages).toContain('garden_hauler/mw_config.h');
  });

  it('answers a second request for the same bundle from its cache', () => {
    const files = uno();
    expect(verifyBundle(files)).toBe(verifyBundle(files.map((f) => ({ ...f }))));
  });

  it('writes only the sketch sources: other files in a sketch folder never reach the compiler', async () => {
    const files = [...uno(), { path: 'garden_hauler/extra.cpp', content: 'this is not C++' }];
    expect((await verifyBundle(files)).sketches[0].ok).toBe(true);
  });

  it('says so instead of compiling when the board has no compiler here', async () => {
    const assigned = assignPins(
      buildStarterConfig({ layout: 'differential', board: 'esp32-devkitc', input: 'sbus', driver: 'pwm-dir' }),
    );
    if (!assigned.ok) throw new Error(assigned.reason);
    const [sketch] = (await verifyBundle(renderBundle(assigned.config, { revision: 1 }))).sketches;
    expect(sketch).toMatchObject({ board: 'esp32-devkitc', ok: null });
    expect(sketch.messages).toContain('only AVR boards are compiled here');
  });

  it('compiles the remote transmitter sketch for its own board', async () => {
    const assigned = assignPins(
      buildStarterConfig({ layout: 'differential', board: 'uno', input: 'nrf24', driver: 'pwm-dir' }),
    );
    if (!assigned.ok) throw new Error(assigned.reason);
    const result = await verifyBundle(renderBundle(assigned.config, { revision: 1 }));
    expect(result.sketches.map((s) => [s.folder, s.board, s.ok])).toEqual([
      ['differential_pair_robot', 'uno', true],
      ['differential_pair_robot_remote', assigned.config.controls.link.remoteBoard, true],
    ]);
  });
});
