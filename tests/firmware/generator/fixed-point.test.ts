import { describe, expect, it } from 'vitest';
import {
  applyCalibrationSide,
  calibrationSide,
  q15Signed,
  q15Unsigned,
} from '@server/features/firmware/model/fixed-point';
import { calibrate } from '@shared/shaping/input-curves';

// The firmware computes calibration as ((d << shift) × k) >> 16 in 16-bit operands; these
// checks hold that integer recipe against the engine's calibrate() in floating point.

describe('calibration constants', () => {
  it.each([1, 3, 1000, 2000, 3276, 16384, 32767])(
    'fit unsigned 16 bits and keep d << shift within 16 bits for a span of %i',
    (span4) => {
      const side = calibrationSide(span4);
      expect(side.k).toBeGreaterThan(0);
      expect(side.k).toBeLessThanOrEqual(65535);
      expect((span4 - 1) * 2 ** side.shift).toBeLessThanOrEqual(65535);
    },
  );

  it('match the engine within 2 units of 16384 over the whole travel of a 1000/1500/2000 µs channel', () => {
    const channel = { low: 1000, centre: 1500, high: 2000 };
    const side = calibrationSide(2000);
    for (let raw = 1500; raw <= 2000; raw++) {
      const firmware = applyCalibrationSide(side, (raw - 1500) * 4);
      expect(Math.abs(firmware - calibrate(raw, channel) * 16384)).toBeLessThanOrEqual(2);
    }
  });

  it('match the engine for an uneven SBUS side (992 to 1811 counts)', () => {
    const side = calibrationSide((1811 - 992) * 4);
    for (const raw of [992, 1000, 1400, 1810]) {
      const firmware = applyCalibrationSide(side, (raw - 992) * 4);
      expect(Math.abs(firmware - calibrate(raw, { low: 172, centre: 992, high: 1811 }) * 16384)).toBeLessThanOrEqual(2);
    }
  });
});

describe('Q15 factors', () => {
  it('hold 1.0 as 32767 in a signed field and refuse what does not fit', () => {
    expect(q15Signed(1)).toBe(32767);
    expect(q15Signed(-1)).toBe(-32767);
    expect(q15Signed(0.5)).toBe(16384);
    expect(() => q15Signed(1.5)).toThrow();
  });

  it('hold up to just under 2.0 in an unsigned field (a deadband rescale of 1 / (1 − 0.5))', () => {
    expect(q15Unsigned(2)).toBe(65535);
    expect(q15Unsigned(1 / 0.96)).toBe(34133);
  });
});
