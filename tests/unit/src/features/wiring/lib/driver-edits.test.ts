import { describe, expect, it } from 'vitest';
import {
  addDriver,
  freeMotors,
  removeDriver,
  setChannelMotor,
  setDriverKind,
} from '@/features/wiring/lib/driver-edits';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { buildConfig, withPins } from '../../../../../fixtures/robot-config-factory';

describe('driver edits', () => {
  it('adds a driver for the motors not yet on one, and none when every motor has one', () => {
    const config = buildConfig({ layout: 'quad-mecanum', driver: 'pwm-dir' });
    expect(addDriver(config)).toBeNull();
    const fewer = removeDriver(config, 1);
    expect(freeMotors(fewer)).toEqual(['Rear right', 'Rear left']);
    const added = addDriver(fewer)!;
    expect(added.wiring.drivers[1]).toMatchObject({
      name: 'Driver 2',
      kind: 'pwm-dir',
      motors: ['Rear right', 'Rear left'],
    });
    expect(Object.keys(added.wiring.drivers[1].pins)).toEqual(['a.pwm', 'a.dir', 'b.pwm', 'b.dir']);
    expect(() => RobotConfigSchema.parse(added)).not.toThrow();
  });

  it('keeps the pins of roles both kinds share when the kind changes, and drops the rest', () => {
    const config = withPins(buildConfig({ driver: 'pwm-dir' }), { 'Driver 1/a.pwm': 'D9', 'Driver 1/a.dir': 'D8' });
    const change = setDriverKind(config, 0, 'pwm-in1-in2-stby');
    const pins = change.config.wiring.drivers[0].pins;
    expect(pins['a.pwm'].pin).toBe('D9');
    expect(pins['a.dir']).toBeUndefined();
    expect(Object.keys(pins)).toEqual(['a.pwm', 'a.in1', 'a.in2', 'b.pwm', 'b.in1', 'b.in2', 'stby']);
    expect(change.dropped).toEqual([{ label: 'Driver 1 a.dir', pin: 'D8' }]);
  });

  it('takes the second motor off a one-channel kind and picks a stop mode the kind can do', () => {
    const config = buildConfig({ driver: 'pwm-dir' });
    const coasting = {
      ...config,
      wiring: {
        ...config.wiring,
        drivers: [{ ...config.wiring.drivers[0], stopMode: 'coast' as const, peakCurrentA: 20 }],
      },
    };
    const change = setDriverKind(coasting, 0, 'servo-esc');
    expect(change.unplacedMotors).toEqual(['Right']);
    expect(change.config.wiring.drivers[0]).toMatchObject({
      motors: ['Left'],
      peakCurrentA: null,
      pwmFrequencyHz: null,
    });
    // PWM + direction modules cannot coast with their pins (the kind has no coast), so coast becomes brake.
    expect(setDriverKind(coasting, 0, 'pwm-dir').config.wiring.drivers[0].stopMode).toBe('brake');
  });

  it('swaps motors between drivers rather than putting one motor on two', () => {
    const config = buildConfig({ layout: 'quad-mecanum', driver: 'pwm-dir' });
    const next = setChannelMotor(config, 0, 0, 'Rear right');
    expect(next.wiring.drivers.map((d) => d.motors)).toEqual([
      ['Rear right', 'Front right'],
      ['Front left', 'Rear left'],
    ]);
  });

  it('empties channel B together with its pins', () => {
    const config = withPins(buildConfig({ driver: 'pwm-dir' }), { 'Driver 1/b.pwm': 'D10' });
    const next = setChannelMotor(config, 0, 1, null);
    expect(next.wiring.drivers[0].motors).toEqual(['Left']);
    expect(Object.keys(next.wiring.drivers[0].pins)).toEqual(['a.pwm', 'a.dir']);
  });
});
