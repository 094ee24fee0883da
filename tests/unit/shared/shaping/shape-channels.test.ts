import { describe, expect, it } from 'vitest';
import { shapeChannel, sticksFromChannels } from '@shared/shaping/shape-channels';
import { isArmed, switchPosition } from '@shared/shaping/switches';
import { makeConfig } from '../../../factories/engine';

describe('switches', () => {
  it('splits a two-position switch at the centre', () => {
    expect(switchPosition(-1, 2)).toBe(0);
    expect(switchPosition(-0.01, 2)).toBe(0);
    expect(switchPosition(0.01, 2)).toBe(1);
  });

  it('splits a three-position switch half-way between positions', () => {
    expect([-1, -0.6, -0.4, 0, 0.4, 0.6, 1].map((v) => switchPosition(v, 3))).toEqual([0, 0, 1, 1, 1, 2, 2]);
  });

  it('arms only on a clear reading at the armed end', () => {
    const high = { channel: 6, armedWhen: 'high' as const };
    expect(isArmed(high, true, 1)).toBe(true);
    expect(isArmed(high, true, 0.2)).toBe(false);
    expect(isArmed(high, true, null)).toBe(false);
    expect(isArmed({ channel: 6, armedWhen: 'low' }, true, -1)).toBe(true);
  });

  it('is armed without a switch unless arming is required', () => {
    expect(isArmed({ channel: null, armedWhen: 'high' }, false, null)).toBe(true);
    expect(isArmed({ channel: null, armedWhen: 'high' }, true, null)).toBe(false);
  });
});

describe('sticks from channels', () => {
  const linear = () =>
    makeConfig('quad-mecanum', (c) => {
      for (const axis of ['forward', 'strafe', 'yaw'] as const)
        Object.assign(c.controls.axes[axis], { deadband: 0, expo: 0 });
    });

  it('shapes each axis and applies the rate switch position', () => {
    const shaped = sticksFromChannels(linear(), { 1: 1750, 2: 2000, 4: 1250, 5: 1000, 6: 2000 });
    expect(shaped.ratePosition).toBe(0);
    expect(shaped.rateScale).toBe(0.5);
    expect(shaped.sticks).toEqual({ forward: 0.5, strafe: 0.25, yaw: -0.25 });
    expect(shaped.armed).toBe(true);
  });

  it('has as many rate switch positions as rates', () => {
    const config = linear();
    config.controls.rateSwitch.rates = [0.25, 0.5, 1];
    const at = (raw: number) => sticksFromChannels(config, { 5: raw, 6: 2000 });
    expect([1000, 1500, 2000].map((raw) => at(raw).ratePosition)).toEqual([0, 1, 2]);
    expect(at(1500).rateScale).toBe(0.5);
  });

  it('treats missing readings as sticks at rest, low rate and disarmed', () => {
    const shaped = sticksFromChannels(linear(), {});
    expect(shaped.sticks).toEqual({ forward: 0, strafe: 0, yaw: 0 });
    expect(shaped.rateScale).toBe(0.5);
    expect(shaped.armed).toBe(false);
  });
});

describe('one channel after shaping', () => {
  it('gives an axis value without the rate switch', () => {
    const config = makeConfig('quad-mecanum', (c) =>
      Object.assign(c.controls.axes.forward, { deadband: 0, expo: 0, rate: 0.8 }),
    );
    expect(shapeChannel(config, 2, 2000)).toEqual({ value: 0.8, role: 'forward' });
  });

  it('gives switch positions and the arming state', () => {
    const config = makeConfig('quad-mecanum');
    expect(shapeChannel(config, 5, 2000)).toEqual({ value: 1, role: 'rate-switch' });
    expect(shapeChannel(config, 6, 1000)).toEqual({ value: 0, role: 'arming-switch' });
  });

  it('refuses a channel that is not in the table', () => {
    expect(() => shapeChannel(makeConfig('quad-mecanum'), 9, 1500)).toThrow(
      /Channel 9 is not in the channel table \(controls.channels\)/,
    );
  });
});
