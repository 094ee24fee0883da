import { describe, expect, it } from 'vitest';
import { computeMixing, mixSticks, whatIfReversed } from '@shared/kinematics/mixing';
import { maxWheelRadps } from '@shared/kinematics/wheel-equation';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import { makeConfig, makeCustomConfig, makeWheel } from '../../../factories/engine';

const column = (matrix: number[][], k: number) => matrix.map((row) => row[k]);
const byMotor = (config: ReturnType<typeof makeConfig>, k: number) => {
  const mixing = computeMixing(config);
  return Object.fromEntries(mixing.motors.map((name, i) => [name, mixing.matrix[i][k]]));
};

describe('the mixing matrix', () => {
  // Trade rule (common practice): on a three-wheel omni base, motion along the direction one
  // wheel drives runs it at full speed and the two angled wheels at cos 60° = 0.5 of it, with the
  // opposite sign; motion at right angles leaves that wheel idle; rotation runs all three equally.
  it('runs the two angled wheels of a trio at half the lone wheel, opposite sign, when strafing', () => {
    const strafe = byMotor(makeConfig('trio-omni'), 1);
    expect(strafe.Front).toBeCloseTo(1, 12);
    expect(strafe['Rear left']).toBeCloseTo(-0.5, 12);
    expect(strafe['Rear right']).toBeCloseTo(-0.5, 12);
  });

  it('leaves the lone trio wheel idle when driving forward', () => {
    const forward = byMotor(makeConfig('trio-omni'), 0);
    expect(forward.Front).toBe(0);
    expect(forward['Rear left']).toBeCloseTo(-forward['Rear right'], 12);
  });

  it('runs every trio wheel equally for a pure turn', () => {
    const yaw = Object.values(byMotor(makeConfig('trio-omni'), 2));
    yaw.forEach((v) => expect(v).toBeCloseTo(1, 9));
  });

  it.each(DRIVE_LAYOUT_IDS)('normalizes every used stick column of %s to peak at 1', (layout) => {
    const mixing = computeMixing(makeConfig(layout));
    const used = [mixing.canDrive, mixing.canStrafe, mixing.canTurn];
    used.forEach((can, k) => {
      const peak = Math.max(...column(mixing.matrix, k).map(Math.abs));
      expect(peak).toBeCloseTo(can ? 1 : 0, 12);
    });
  });

  it('gives mecanum wheels the stick signs of the X pattern', () => {
    const mixing = computeMixing(makeConfig('quad-mecanum'));
    expect(mixing.motors).toEqual(['Front left', 'Front right', 'Rear right', 'Rear left']);
    // Strafe right: front-left and rear-right forwards; yaw right (clockwise): the left side forwards.
    expect(mixing.matrix).toEqual([
      [1, 1, 1],
      [1, -1, -1],
      [1, 1, -1],
      [1, -1, 1],
    ]);
  });

  it('reports that a differential pair cannot strafe and ignores its strafe stick', () => {
    const mixing = computeMixing(makeConfig('differential'));
    expect(mixing.rank).toBe(2);
    expect(mixing.canStrafe).toBe(false);
    expect(mixing.canDrive && mixing.canTurn).toBe(true);
    expect(column(mixing.matrix, 1)).toEqual([0, 0]);
    expect(mixing.fullScale.strafeMps).toBe(0);
    expect(mixing.notes.join(' ')).toMatch(/cannot move sideways; the strafe stick is ignored by design/);
    expect(mixSticks(mixing, { forward: 0, strafe: 1, yaw: 0 })).toEqual([0, 0]);
  });

  it('finds the full-scale speeds from the wheel top speeds', () => {
    const config = makeConfig('differential');
    const wheel = config.chassis.wheels[0];
    const mixing = computeMixing(config);
    const rimSpeed = (wheel.radiusMm / 1000) * maxWheelRadps(wheel);
    expect(mixing.fullScale.forwardMps).toBeCloseTo(rimSpeed, 12);
    // A full turn runs the wheels at ±full speed: ω = 2·v / track width.
    expect(mixing.fullScale.yawRadps).toBeCloseTo((2 * rimSpeed) / 0.2, 9);
  });

  it('combines wheels that share a motor into one row', () => {
    const twoMotors = makeConfig('skid-steer');
    twoMotors.chassis.wheels.forEach((w) => (w.motor = w.yMm > 0 ? 'Left' : 'Right'));
    twoMotors.motors = [
      { ...twoMotors.motors[0], name: 'Left' },
      { ...twoMotors.motors[0], name: 'Right' },
    ];
    expect(computeMixing(twoMotors).matrix).toEqual(computeMixing(makeConfig('differential')).matrix);
  });

  it('says when no motor can move the robot', () => {
    const stuck = computeMixing(
      makeCustomConfig([
        makeWheel({ name: 'A', motor: 'A', xMm: 0, yMm: 50 }),
        makeWheel({ name: 'B', motor: 'A', xMm: 0, yMm: 50, reversed: true }),
      ]),
    );
    expect(stuck.rank).toBe(0);
    expect(stuck.notes[0]).toMatch(/No motor can move this robot/);
  });
});

describe('what if a motor were reversed', () => {
  it('says a differential pair spins when asked to drive forward with one side reversed', () => {
    const report = whatIfReversed(makeConfig('differential'), 'Left');
    const forward = report.cases.find((c) => c.axis === 'forward')!;
    expect(forward.changed).toBe(true);
    expect(forward.sentence).toBe(
      'Forward stick: instead of driving forward, the robot spins left (counter-clockwise) on the spot at 100 %.',
    );
    expect(report.cases.find((c) => c.axis === 'strafe')!.applicable).toBe(false);
  });

  it('says a trio turns instead of strafing when its lone wheel is reversed', () => {
    const report = whatIfReversed(makeConfig('trio-omni'), 'Front');
    const strafe = report.cases.find((c) => c.axis === 'strafe')!;
    expect(strafe.sentence).toMatch(/^Strafe stick: instead of sliding right, the robot .*turns left/);
    expect(strafe.result.sticks.yaw).toBeLessThan(-0.5);
    // Forward leaves the lone wheel idle, so reversing it changes nothing there.
    expect(report.cases.find((c) => c.axis === 'forward')!.changed).toBe(false);
    expect(report.summary).toMatch(/^If Front turned the other way:/);
  });

  it('rejects an unknown motor name', () => {
    expect(() => whatIfReversed(makeConfig('trio-omni'), 'Nope')).toThrow('No motor is named "Nope"');
  });
});
