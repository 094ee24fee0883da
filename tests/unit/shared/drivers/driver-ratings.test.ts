import { describe, expect, it } from 'vitest';
import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import { DRIVER_KIND_IDS } from '@shared/schemas/ids';

describe('driver kinds against their datasheets (REFERENCES §7)', () => {
  it('gives the TB6612 class 100 kHz PWM, 1.2 A average, 3.2 A peak and VM 2.5–13.5 V (TB6612FNG datasheet)', () => {
    const k = DRIVER_KINDS['pwm-in1-in2-stby'];
    expect(k.maxPwmHz).toBe(100_000);
    expect(k.ratings).toMatchObject({ continuousA: 1.2, peakA: 3.2, motorVolts: { min: 2.5, max: 13.5 } });
    expect(k.logic.supplyVolts).toEqual({ min: 2.7, max: 5.5 });
  });

  it('gives the L298 class 2 A DC and 3 A peak per channel, up to 46 V, inputs high from 2.3 V (L298 datasheet)', () => {
    const k = DRIVER_KINDS['en-in1-in2'];
    expect(k.ratings).toMatchObject({ continuousA: 2, peakA: 3, motorVolts: { max: 46 } });
    // VS from VIH + 2.5 V: 2.3 + 2.5 = 4.8 V.
    expect(k.ratings.motorVolts!.min).toBeCloseTo(2.3 + 2.5, 6);
    expect(k.logic.minHigh).toEqual({ volts: 2.3 });
    expect(k.maxPwmHz).toBe(25_000);
  });

  it('gives the DRV8833 class 1.5 A RMS, 2 A peak and VM 2.7–10.8 V (DRV8833 datasheet)', () => {
    expect(DRIVER_KINDS['two-input'].ratings).toMatchObject({
      continuousA: 1.5,
      peakA: 2,
      motorVolts: { min: 2.7, max: 10.8 },
    });
  });

  it('limits the dual half-bridge class to 25 kHz PWM', () => {
    expect(DRIVER_KINDS['dual-pwm'].maxPwmHz).toBe(25_000);
  });

  it('gives ESCs no PWM frequency and leaves their ratings to the ESC’s label', () => {
    expect(DRIVER_KINDS['servo-esc']).toMatchObject({ maxPwmHz: null, ratings: { continuousA: null, peakA: null } });
  });

  it('says how every kind brakes, and which cannot coast', () => {
    for (const id of DRIVER_KIND_IDS) expect(DRIVER_KINDS[id].stopModes.brake).not.toBeNull();
    expect(DRIVER_KIND_IDS.filter((id) => DRIVER_KINDS[id].stopModes.coast === null)).toEqual(['pwm-dir']);
  });

  it('keeps a PWM role for every motor channel of every kind but the ESC', () => {
    for (const id of DRIVER_KIND_IDS.filter((k) => k !== 'servo-esc')) {
      const roles = driverPinRoles(id, DRIVER_KINDS[id].channels);
      expect(roles.filter((r) => r.need === 'pwm').length).toBeGreaterThanOrEqual(DRIVER_KINDS[id].channels);
    }
  });
});
