import { describe, expect, it } from 'vitest';
import { applyStickDeadzone, combineSticks, firstPad, gamepadSticks } from '@/features/robot-editor/lib/gamepad';

const pad = (axes: number[], connected = true) => ({ axes, connected, id: 'pad' });

describe('the gamepad map', () => {
  it('drives forward with the right stick pushed up (its y axis reads −1)', () => {
    expect(gamepadSticks(pad([0, 0, 0, -1]))).toEqual({ forward: 1, strafe: 0, yaw: 0 });
  });

  it('strafes right with the right stick and turns right with the left stick', () => {
    expect(gamepadSticks(pad([1, 0.7, 1, 0]))).toEqual({ forward: 0, strafe: 1, yaw: 1 });
  });

  it('reads a pad resting a little off centre as centred', () => {
    expect(gamepadSticks(pad([0.06, -0.05, -0.07, 0.04]))).toEqual({ forward: 0, strafe: 0, yaw: 0 });
  });

  it('grows from 0 at the dead zone edge to 1 at the end', () => {
    expect(applyStickDeadzone(0.1, 0).x).toBe(0);
    expect(applyStickDeadzone(0.55, 0).x).toBeCloseTo(0.5, 12);
    expect(applyStickDeadzone(1, 0).x).toBeCloseTo(1, 12);
  });

  it('uses the first connected pad with enough axes', () => {
    const pads = [null, pad([0, 0], true), pad([0, 0, 0, 0], false), pad([0, 0, 0, 0.5], true)];
    expect(firstPad(pads)).toBe(pads[3]);
    expect(firstPad([null])).toBeNull();
  });

  it('takes, per axis, the source pushed further', () => {
    expect(combineSticks({ forward: 0.2, strafe: -0.9, yaw: 0 }, { forward: -0.5, strafe: 0.3, yaw: 0 })).toEqual({
      forward: -0.5,
      strafe: -0.9,
      yaw: 0,
    });
  });
});
