import { describe, expect, it } from 'vitest';
import { motionEnvelope } from '@shared/kinematics/envelope';
import { maxWheelRadps } from '@shared/kinematics/wheel-equation';
import { makeConfig } from '../../../factories/engine';

const rimSpeed = (config: ReturnType<typeof makeConfig>) => {
  const wheel = config.chassis.wheels[0];
  return (wheel.radiusMm / 1000) * maxWheelRadps(wheel);
};

describe('the motion envelope', () => {
  it('samples 360 headings by default, counter-clockwise from forward', () => {
    const envelope = motionEnvelope(makeConfig('quad-mecanum'));
    expect(envelope.samples).toHaveLength(360);
    expect(envelope.samples[0].headingDeg).toBe(0);
    expect(envelope.samples[90].headingDeg).toBe(90);
  });

  it('lets a differential pair go only straight ahead or back, at its rim speed', () => {
    const config = makeConfig('differential');
    const envelope = motionEnvelope(config, 8);
    expect(envelope.samples.map((s) => s.speedMps > 0)).toEqual([true, false, false, false, true, false, false, false]);
    expect(envelope.samples[0].speedMps).toBeCloseTo(rimSpeed(config), 12);
    // Spinning on the spot runs the wheels at ±rim speed: ω = 2v / track width (0.2 m).
    expect(envelope.topYawRadps).toBeCloseTo((2 * rimSpeed(config)) / 0.2, 9);
  });

  it('gives a mecanum base its rim speed ahead and sideways and 1/√2 of it diagonally', () => {
    const config = makeConfig('quad-mecanum');
    const { samples } = motionEnvelope(config, 8);
    const v = rimSpeed(config);
    expect(samples[0].speedMps).toBeCloseTo(v, 12);
    expect(samples[2].speedMps).toBeCloseTo(v, 12);
    expect(samples[1].speedMps).toBeCloseTo(v / Math.SQRT2, 12);
  });

  // Three omni wheels (common practice): along one wheel's driving direction that wheel runs
  // flat out and limits the speed to its rim speed; at right angles to it the other two run at
  // cos 30° and allow rim speed / cos 30°.
  it('gives a trio its rim speed along a wheel and rim speed / cos 30° across it', () => {
    const config = makeConfig('trio-omni');
    const { samples, topSpeedMps } = motionEnvelope(config, 12);
    const v = rimSpeed(config);
    expect(samples[3].speedMps).toBeCloseTo(v, 12); // 90°: along the front wheel (it drives sideways)
    expect(samples[0].speedMps).toBeCloseTo(v / Math.cos(Math.PI / 6), 12);
    expect(topSpeedMps).toBeCloseTo(v / Math.cos(Math.PI / 6), 12);
  });

  it('reaches the wheel limit with full stick in every heading of the starter layouts', () => {
    for (const layout of ['trio-omni', 'quad-mecanum', 'quad-omni-x', 'h-drive'] as const) {
      motionEnvelope(makeConfig(layout), 36).samples.forEach((s) => expect(s.fullStickMps).toBeCloseTo(s.speedMps, 9));
    }
  });
});
