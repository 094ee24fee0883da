import { describe, expect, it } from 'vitest';
import { driveStep, rampToward } from '@shared/kinematics/drive-step';
import { computeMixing, forwardKinematics, mixSticks, type Sticks } from '@shared/kinematics/mixing';
import { DRIVE_LAYOUT_IDS, STICK_AXES } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { shapeAxis } from '@shared/shaping/input-curves';
import { makeConfig } from '../../../factories/engine';
import { seededRandom } from '../../../factories/random';

const randomSticks = (random: () => number): Sticks => ({
  forward: random() * 2 - 1,
  strafe: random() * 2 - 1,
  yaw: random() * 2 - 1,
});

/** Shaping that changes nothing: no deadband, linear, full rate; no threshold, no limit. */
function neutral(config: RobotConfig): void {
  STICK_AXES.forEach(
    (axis) => (config.controls.axes[axis] = { ...config.controls.axes[axis], deadband: 0, expo: 0, rate: 1 }),
  );
  config.controls.rateSwitch = { ...config.controls.rateSwitch, channel: null };
  config.motors.forEach((m) => (m.startThreshold = 0));
  config.safety.outputLimitPercent = 100;
}

describe('the drive step', () => {
  it.each(DRIVE_LAYOUT_IDS)('gives the engine mixing of the sticks for %s when shaping is neutral', (layout) => {
    const config = makeConfig(layout, neutral);
    const mixing = computeMixing(config);
    const random = seededRandom(6);
    for (let i = 0; i < 200; i += 1) {
      const sticks = randomSticks(random);
      // An axis the starter maps to no channel (strafe on a differential pair) reads 0, as in the firmware.
      const expected = mixSticks(
        mixing,
        { ...sticks, strafe: config.controls.axes.strafe.channel === null ? 0 : sticks.strafe },
        'scale',
      );
      const step = driveStep(config, sticks, { mixing });
      step.outputs.forEach((v, k) => expect(v).toBeCloseTo(expected[k], 12));
    }
  });

  it('equals shaping, mixing, and the start threshold within the output limit composed by hand, for random sticks', () => {
    const config = makeConfig('quad-mecanum', (c) => {
      c.controls.axes.forward = { ...c.controls.axes.forward, deadband: 0.06, expo: 0.4, rate: 0.9 };
      c.controls.axes.yaw = { ...c.controls.axes.yaw, deadband: 0.1, expo: 0.7, rate: 0.6 };
      c.controls.desaturation = 'clip';
      c.safety.outputLimitPercent = 70;
      c.motors.forEach((m, i) => (m.startThreshold = 0.05 * (i + 1)));
    });
    const mixing = computeMixing(config);
    const unit = { low: -1, centre: 0, high: 1 };
    const random = seededRandom(17);
    for (let i = 0; i < 200; i += 1) {
      const sticks = randomSticks(random);
      const rateScale = config.controls.rateSwitch.rates[1];
      const shaped = Object.fromEntries(
        STICK_AXES.map((a) => [
          a,
          shapeAxis(sticks[a], unit, { ...config.controls.axes[a], reverse: false }, rateScale),
        ]),
      ) as Sticks;
      const limited = mixSticks(mixing, shaped, 'clip').map((c) => c * 0.7);
      const mixed = mixSticks(mixing, shaped, 'clip');
      const outputs = mixed
        .map((c, k) => config.motors[k].startThreshold + (0.7 - config.motors[k].startThreshold) * Math.abs(c))
        .map((v, k) => (Math.abs(mixed[k]) < 1e-6 ? 0 : Math.sign(mixed[k]) * v));
      const step = driveStep(config, sticks, { mixing, ratePosition: 1 });
      step.outputs.forEach((v, k) => expect(v).toBeCloseTo(outputs[k], 12));
      expect(step.motion.twist.vxMps).toBeCloseTo(forwardKinematics(mixing, limited).twist.vxMps, 12);
    }
  });

  it('reads a missing rate switch position as the lowest rate, like the engine', () => {
    const config = makeConfig(
      'quad-mecanum',
      (c) => (c.controls.axes.forward = { ...c.controls.axes.forward, deadband: 0, expo: 0, rate: 1 }),
    );
    const step = driveStep(config, { forward: 1, strafe: 0, yaw: 0 });
    expect(step.shapedSticks.forward).toBeCloseTo(config.controls.rateSwitch.rates[0], 12);
  });

  it('does not reverse the sticks, which are already in the driver’s view', () => {
    const config = makeConfig('differential', (c) => (c.controls.axes.forward.reverse = true));
    expect(
      driveStep(config, { forward: 1, strafe: 0, yaw: 0 }, { ratePosition: 1 }).shapedSticks.forward,
    ).toBeGreaterThan(0);
  });

  it('names the axes it ignores: unmapped, or a motion the layout cannot make', () => {
    const config = makeConfig('differential', (c) => (c.controls.axes.strafe.channel = 1));
    expect(driveStep(config, { forward: 0, strafe: 1, yaw: 0 }).ignoredAxes).toEqual(['strafe']);
    const unmapped = makeConfig('quad-mecanum', (c) => (c.controls.axes.yaw.channel = null));
    expect(driveStep(unmapped, { forward: 0, strafe: 0, yaw: 1 }).ignoredAxes).toEqual(['yaw']);
  });

  it('moves each command toward its target by at most the ramp limit times the step', () => {
    const config = makeConfig('differential', (c) => (c.safety.rampPerSecond = 4));
    const step = driveStep(
      config,
      { forward: 1, strafe: 0, yaw: 0 },
      { ratePosition: 1, ramp: { previous: [0, 0], dtS: 0.05 } },
    );
    step.ramped.forEach((c) => expect(c).toBeCloseTo(0.2, 12));
    expect(step.targets.every((t) => t > 0.2)).toBe(true);
  });

  it('reaches the target once the ramp has had time', () => {
    expect(rampToward([0.1, -0.9], [0.3, -1], 0.5)).toEqual([0.3, -1]);
    expect(rampToward([], [1], 0.25)).toEqual([0.25]);
  });
});
