import { describe, expect, it } from 'vitest';
import { engineProblems } from '@shared/problems/engine-problems';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import { makeConfig, makeCustomConfig, makeWheel } from '../../../factories/engine';

const codes = (config: Parameters<typeof engineProblems>[0]) => engineProblems(config).map((p) => p.code);
const find = (config: Parameters<typeof engineProblems>[0], code: string) =>
  engineProblems(config).find((p) => p.code === code);

describe('engine problems', () => {
  it.each(DRIVE_LAYOUT_IDS)('finds nothing wrong with the %s starter', (layout) => {
    expect(engineProblems(makeConfig(layout))).toEqual([]);
  });

  it('warns that a differential pair ignores a mapped strafe input by design', () => {
    const config = makeConfig('differential', (c) => {
      c.controls.channels.push({ number: 1, name: 'Strafe', low: 1000, centre: 1500, high: 2000 });
      c.controls.axes.strafe.channel = 1;
    });
    const problem = find(config, 'layout-cannot-strafe');
    expect(problem).toMatchObject({ severity: 'warning', path: ['controls', 'axes', 'strafe', 'channel'] });
    expect(problem!.message).toMatch(/ignored by design/);
  });

  it('reports a layout that cannot move at all as an error', () => {
    const config = makeCustomConfig([
      makeWheel({ name: 'A', motor: 'A' }),
      makeWheel({ name: 'B', motor: 'A', reversed: true }),
    ]);
    expect(find(config, 'layout-cannot-move')).toMatchObject({ severity: 'error', path: ['chassis', 'wheels'] });
  });

  it('warns that a square O-pattern mecanum base cannot turn', () => {
    const config = makeConfig('quad-mecanum', (c) => {
      c.chassis.wheels.forEach((w) => (w.rollerAngleDeg = -w.rollerAngleDeg));
      c.chassis.wheels.forEach((w) => {
        w.xMm = Math.sign(w.xMm) * 100;
        w.yMm = Math.sign(w.yMm) * 100;
      });
    });
    expect(find(config, 'layout-cannot-turn')).toMatchObject({ severity: 'warning', path: ['chassis', 'wheels'] });
  });

  it('finds wheels on one motor that would turn against each other', () => {
    const config = makeConfig('skid-steer', (c) => {
      c.chassis.wheels.forEach((w) => (w.motor = w.yMm > 0 ? 'Front left' : 'Front right'));
      c.chassis.wheels[3].reversed = true;
      c.motors = c.motors.slice(0, 2);
    });
    expect(find(config, 'shared-motor-opposed')).toMatchObject({
      severity: 'error',
      path: ['chassis', 'wheels', 3, 'reversed'],
    });
  });

  it('finds wheels on one motor that need different speeds', () => {
    const config = makeConfig('skid-steer', (c) => {
      c.chassis.wheels.forEach((w) => (w.motor = w.yMm > 0 ? 'Front left' : 'Front right'));
      c.chassis.wheels[3].radiusMm = 50;
      c.motors = c.motors.slice(0, 2);
    });
    expect(find(config, 'shared-motor-disagrees')).toMatchObject({
      severity: 'warning',
      path: ['chassis', 'wheels', 3, 'motor'],
    });
  });

  it('reports arming required without an arming channel as an error', () => {
    const config = makeConfig('trio-omni', (c) => {
      c.controls.armingSwitch.channel = null;
      c.safety.armingRequired = true;
    });
    expect(find(config, 'arming-without-channel')).toMatchObject({
      severity: 'error',
      path: ['controls', 'armingSwitch', 'channel'],
    });
  });

  it('warns about an axis the layout can do but no channel drives', () => {
    const config = makeConfig('trio-omni', (c) => (c.controls.axes.yaw.channel = null));
    expect(find(config, 'axis-without-channel')).toMatchObject({ path: ['controls', 'axes', 'yaw', 'channel'] });
  });

  it('warns about one channel used for two roles', () => {
    const config = makeConfig('trio-omni', (c) => (c.controls.rateSwitch.channel = 4));
    expect(find(config, 'channel-used-twice')).toMatchObject({ path: ['controls', 'rateSwitch', 'channel'] });
  });

  it('reports a channel the input source does not carry', () => {
    const config = makeConfig('trio-omni', (c) => (c.controls.channels[4].number = 12));
    expect(codes(config)).toContain('channel-beyond-source');
    expect(find(config, 'channel-beyond-source')!.path).toEqual(['controls', 'channels', 4, 'number']);
  });

  it('warns about plain wheels that are not parallel', () => {
    const config = makeConfig('differential', (c) => (c.chassis.wheels[1].driveAngleDeg = 30));
    expect(find(config, 'plain-wheels-not-parallel')).toMatchObject({
      path: ['chassis', 'wheels', 1, 'driveAngleDeg'],
    });
  });

  it('warns about a mecanum wheel without angled rollers', () => {
    const config = makeConfig('quad-mecanum', (c) => (c.chassis.wheels[0].rollerAngleDeg = 0));
    expect(find(config, 'roller-angle-unusual')).toMatchObject({ path: ['chassis', 'wheels', 0, 'rollerAngleDeg'] });
  });
});
