import { describe, expect, it } from 'vitest';
import { integratePose, START_POSE } from '@/features/robot-editor/lib/pose';

describe('integrating the robot’s pose', () => {
  it('drives straight ahead along world x at the start heading', () => {
    const pose = integratePose(START_POSE, { vxMps: 0.5, vyMps: 0, omegaRadps: 0 }, 2);
    expect(pose).toEqual({ xM: 1, yM: 0, thetaRad: 0 });
  });

  it('slides along world −y for a strafe to the right', () => {
    const pose = integratePose(START_POSE, { vxMps: 0, vyMps: -0.25, omegaRadps: 0 }, 4);
    expect(pose.xM).toBeCloseTo(0, 12);
    expect(pose.yM).toBeCloseTo(-1, 12);
  });

  it('drives forward in world y once turned a quarter left', () => {
    const pose = integratePose({ xM: 0, yM: 0, thetaRad: Math.PI / 2 }, { vxMps: 1, vyMps: 0, omegaRadps: 0 }, 1);
    expect(pose.xM).toBeCloseTo(0, 12);
    expect(pose.yM).toBeCloseTo(1, 12);
  });

  it('comes back to the start after a whole circle, however it is cut into steps', () => {
    const twist = { vxMps: 0.4, vyMps: 0.1, omegaRadps: -1.3 };
    const period = (2 * Math.PI) / Math.abs(twist.omegaRadps);
    let pose = START_POSE;
    const steps = 97;
    for (let i = 0; i < steps; i += 1) pose = integratePose(pose, twist, period / steps);
    expect(pose.xM).toBeCloseTo(0, 9);
    expect(pose.yM).toBeCloseTo(0, 9);
    expect(pose.thetaRad).toBeCloseTo(-2 * Math.PI, 9);
  });

  it('runs a quarter circle of radius v/ω to the left when turning counter-clockwise', () => {
    const pose = integratePose(START_POSE, { vxMps: 1, vyMps: 0, omegaRadps: 0.5 }, Math.PI);
    // Radius 2 m: a quarter turn ends 2 m ahead and 2 m to the left.
    expect(pose.xM).toBeCloseTo(2, 12);
    expect(pose.yM).toBeCloseTo(2, 12);
  });
});
