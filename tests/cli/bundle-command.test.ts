import { readFile } from 'node:fs/promises';
import JSZip from 'jszip';
import { beforeAll, describe, expect, it } from 'vitest';
import { sampleConfigInput } from '../factories/robot-config';
import { cli, useScratchDir } from './support/run-cli';

const scratch = useScratchDir('mixwright-bundle-');
let configPath: string;

beforeAll(async () => {
  configPath = await scratch.file('robot.json', sampleConfigInput());
});

describe('the bundle command', { timeout: 60_000 }, () => {
  it('writes the bundle as a zip and lists its files', async () => {
    const out = scratch.path('out.zip');
    const result = await cli('bundle', configPath, '-o', out, '--revision', '5');
    expect(result.code).toBe(0);
    const summary = JSON.parse(result.stdout);
    expect(summary).toMatchObject({ revision: 5, zip: out });
    const zip = await JSZip.loadAsync(await readFile(out));
    expect(Object.keys(zip.files).sort()).toEqual([...summary.files].sort());
    expect(await zip.file('garden_hauler/mw_config.h')!.async('string')).toContain('#define MW_REVISION 5UL');
  });

  it('writes the bundle into a folder', async () => {
    const out = scratch.path('folder');
    expect((await cli('bundle', configPath, '--dir', out)).code).toBe(0);
    expect(await readFile(scratch.path('folder/garden_hauler/garden_hauler.ino'), 'utf8')).toContain('void loop()');
  });

  it('asks where to write when neither -o nor --dir is given', async () => {
    const result = await cli('bundle', configPath);
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('-o <file.zip> or --dir <folder>');
  });

  it('names the field when the configuration cannot become firmware', async () => {
    const config = sampleConfigInput();
    config.wiring.drivers[0].pins = {};
    const path = await scratch.file('unwired.json', config);
    const result = await cli('bundle', path, '-o', scratch.path('x.zip'));
    expect(result.code).toBe(1);
    expect(result.stderr).toContain('wiring.drivers.0.pins.a.pwm.pin');
  });

  it('refuses a revision that is not a whole number', async () => {
    const result = await cli('bundle', configPath, '-o', scratch.path('y.zip'), '--revision', 'two');
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('--revision must be a whole number');
  });
});
