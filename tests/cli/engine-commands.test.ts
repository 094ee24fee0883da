import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { rawConfig } from '../factories/engine';
import { cli, useScratchDir } from './support/run-cli';

const { file } = useScratchDir('mixwright-cli-');

describe('the engine commands', { timeout: 60_000 }, () => {
  it('prints a complete, valid starter configuration', async () => {
    const out = await cli(
      'starter',
      'quad-mecanum',
      '--board',
      'esp32-devkitc',
      '--input',
      'sbus',
      '--driver',
      'pwm-dir',
    );
    expect(out.code).toBe(0);
    const config = RobotConfigSchema.parse(JSON.parse(out.stdout));
    expect(config.wiring.board).toBe('esp32-devkitc');
    expect(config.controls.source).toBe('sbus');
    expect(config.wiring.drivers.map((d) => d.kind)).toEqual(['pwm-dir', 'pwm-dir']);
  });

  it('rejects an unknown layout, naming it', async () => {
    const out = await cli('starter', 'hexapod');
    expect(out.code).not.toBe(0);
    expect(out.stderr).toMatch(/^layout: "hexapod" is not known/);
    expect(out.stdout).toBe('');
  });

  it('prints the mixing matrix, rank and envelope', async () => {
    const out = await cli('matrix', await file('mecanum.json', rawConfig('quad-mecanum')));
    expect(out.code).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(Object.keys(result)).toEqual(['motors', 'matrix', 'rank', 'envelope']);
    expect(result.motors).toEqual(['Front left', 'Front right', 'Rear right', 'Rear left']);
    expect(result.matrix).toEqual([
      [1, 1, 1],
      [1, -1, -1],
      [1, 1, -1],
      [1, -1, 1],
    ]);
    expect(result.rank).toBe(3);
    expect(result.envelope.samples).toHaveLength(360);
    expect(result.envelope.topSpeedMps).toBeGreaterThan(0);
  });

  it('mixes stick commands, negative numbers included, and desaturates by scaling', async () => {
    const path = await file('mix.json', rawConfig('quad-mecanum'));
    const out = await cli('mix', path, '--forward', '1', '--strafe', '-0.5', '--yaw', '0.5');
    expect(out.code).toBe(0);
    // Raw 1, 1, 0, 2 (forward + strafe·column + yaw·column) scaled by 1/2.
    expect(JSON.parse(out.stdout)).toEqual({
      motors: [
        { name: 'Front left', command: 0.5 },
        { name: 'Front right', command: 0.5 },
        { name: 'Rear right', command: 0 },
        { name: 'Rear left', command: 1 },
      ],
    });
  });

  it('rejects a stick command outside −1..1, naming the option', async () => {
    const out = await cli('mix', await file('mix2.json', rawConfig('differential')), '--yaw', '1.5');
    expect(out.code).not.toBe(0);
    expect(out.stderr).toMatch(/--yaw must be between -1 and 1/);
  });

  it('shapes one channel reading', async () => {
    const config = rawConfig('trio-omni');
    Object.assign(config.controls.axes.forward, { deadband: 0, expo: 0, rate: 0.5 });
    const out = await cli('shape', await file('shape.json', config), '--channel', '2', '--raw', '1750');
    expect(out.code).toBe(0);
    expect(JSON.parse(out.stdout)).toEqual({ value: 0.25 });
  });

  it('rejects a channel that is not in the table, naming the field', async () => {
    const out = await cli(
      'shape',
      await file('shape2.json', rawConfig('trio-omni')),
      '--channel',
      '9',
      '--raw',
      '1500',
    );
    expect(out.code).not.toBe(0);
    expect(out.stderr).toMatch(/controls\.channels/);
  });

  it('rejects an invalid configuration with the field path', async () => {
    const config = rawConfig('trio-omni');
    config.chassis.wheels[1].radiusMm = 0;
    const out = await cli('matrix', await file('bad.json', config));
    expect(out.code).not.toBe(0);
    expect(out.stderr).toMatch(/chassis\.wheels\.1\.radiusMm: Radius must be more than 0 mm/);
  });

  it('reads a file saved at schema version 1, three-position rate switch included', async () => {
    const path = join(process.cwd(), 'tests/fixtures/configs/v1/aisle-scout.json');
    const out = await cli('shape', path, '--channel', '6', '--raw', '1811');
    expect(out.code).toBe(0);
    expect(JSON.parse(out.stdout)).toEqual({ value: 2 });
  });

  it('rejects a file that is not JSON', async () => {
    const out = await cli('mix', await file('broken.json', '{ "schemaVersion": '));
    expect(out.code).not.toBe(0);
    expect(out.stderr).toMatch(/is not valid JSON/);
  });
});
