import { describe, expect, it } from 'vitest';
import {
  addChannel,
  changeSource,
  randomLinkAddress,
  removeChannel,
  renumberChannel,
  setRatePositions,
} from '@/features/robot-editor/lib/controls-edits';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';

const rc = () => buildStarterConfig({ layout: 'quad-mecanum', input: 'rc-pwm' });

describe('controls edits', () => {
  it('resets calibration to the new source’s range and its pins to its roles', () => {
    const next = changeSource(rc(), 'sbus');
    expect(next.controls.channels.every((c) => c.low === 172 && c.centre === 992 && c.high === 1811)).toBe(true);
    expect(Object.keys(next.wiring.inputPins)).toEqual(['rx']);
    expect(next.controls.axes).toEqual(rc().controls.axes);
  });

  it('adds the lowest free channel with a pin role for a one-wire-per-channel receiver', () => {
    const next = addChannel(rc());
    expect(next.controls.channels.map((c) => c.number)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(next.wiring.inputPins.ch3).toEqual({ pin: null, locked: false });
  });

  it('leaves the stick that used a removed channel without a channel', () => {
    const config = rc();
    const next = removeChannel(
      config,
      config.controls.channels.findIndex((c) => c.number === 4),
    );
    expect(next.controls.axes.yaw.channel).toBeNull();
    expect(next.wiring.inputPins.ch4).toBeUndefined();
  });

  it('moves the stick map along when a channel is renumbered', () => {
    const config = rc();
    const result = renumberChannel(
      config,
      config.controls.channels.findIndex((c) => c.number === 2),
      3,
    );
    if (!result.ok) throw new Error(result.reason);
    expect(result.config.controls.axes.forward.channel).toBe(3);
    expect(RobotConfigSchema.safeParse(result.config).success).toBe(true);
  });

  it('refuses a number another channel has', () => {
    expect(renumberChannel(rc(), 0, 2)).toEqual({ ok: false, reason: 'Channel 2 is already in the table' });
  });

  it('gives a three-position rate switch a middle rate between low and high', () => {
    const next = setRatePositions(rc(), 3);
    expect(next.controls.rateSwitch).toMatchObject({ rates: [0.5, 0.75, 1] });
    expect(RobotConfigSchema.safeParse(next).success).toBe(true);
  });

  it('writes a link address as ten hexadecimal digits', () => {
    expect(randomLinkAddress(() => new Uint8Array([0x4d, 0x0a, 0xff, 0x00, 0x7b]))).toBe('4D0AFF007B');
    expect(randomLinkAddress()).toMatch(/^[0-9A-F]{10}$/);
  });
});
