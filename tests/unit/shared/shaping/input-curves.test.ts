import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyDeadband, applyExpo, calibrate, shapeAxis } from '@shared/shaping/input-curves';

const calibration = fc
  .record({
    centre: fc.double({ min: 900, max: 2100, noNaN: true }),
    below: fc.double({ min: 50, max: 800, noNaN: true }),
    above: fc.double({ min: 50, max: 800, noNaN: true }),
  })
  .map(({ centre, below, above }) => ({ low: centre - below, centre, high: centre + above }));
const axis = fc.record({
  reverse: fc.constant(false),
  deadband: fc.double({ min: 0, max: 0.5, noNaN: true }),
  expo: fc.double({ min: 0, max: 1, noNaN: true }),
  rate: fc.double({ min: 0.05, max: 1, noNaN: true }),
});
const raw = fc.double({ min: 0, max: 3000, noNaN: true });

describe('calibration', () => {
  it('reaches −1, 0 and +1 at uneven end points and centre', () => {
    const c = { low: 1020, centre: 1500, high: 1960 };
    expect(calibrate(1020, c)).toBe(-1);
    expect(calibrate(1500, c)).toBe(0);
    expect(calibrate(1960, c)).toBe(1);
    expect(calibrate(1260, c)).toBeCloseTo(-0.5, 12);
    expect(calibrate(1730, c)).toBeCloseTo(0.5, 12);
  });

  it('holds values past the end points at ±1', () => {
    expect(calibrate(2100, { low: 1000, centre: 1500, high: 2000 })).toBe(1);
    expect(calibrate(900, { low: 1000, centre: 1500, high: 2000 })).toBe(-1);
  });

  // SBUS counts 172–1811 for ±100 %, centre 992 (open SBUS descriptions).
  it('maps the SBUS end counts to ±1', () => {
    const sbus = { low: 172, centre: 992, high: 1811 };
    expect(calibrate(172, sbus)).toBe(-1);
    expect(calibrate(1811, sbus)).toBe(1);
  });
});

describe('deadband, expo and rate', () => {
  it('reads as 0 inside the deadband and rises from 0 at its edge to 1 at the end', () => {
    expect(applyDeadband(0.05, 0.1)).toBe(0);
    expect(applyDeadband(0.1, 0.1)).toBe(0);
    expect(applyDeadband(0.55, 0.1)).toBeCloseTo(0.5, 12);
    expect(applyDeadband(1, 0.1)).toBe(1);
    expect(applyDeadband(-1, 0.1)).toBe(-1);
  });

  // Expo curve y = (1 − e)·x + e·x³ (common practice in RC transmitters).
  it('follows (1 − e)·x + e·x³', () => {
    expect(applyExpo(0.5, 0.3)).toBeCloseTo(0.7 * 0.5 + 0.3 * 0.125, 12);
    expect(applyExpo(1, 0.8)).toBeCloseTo(1, 12);
    expect(applyExpo(-0.4, 0)).toBe(-0.4);
    expect(applyExpo(0.5, 1)).toBeCloseTo(0.125, 12);
  });

  it('chains calibration, reverse, deadband, expo and rate', () => {
    const value = shapeAxis(
      1750,
      { low: 1000, centre: 1500, high: 2000 },
      { reverse: true, deadband: 0.1, expo: 0.5, rate: 0.8 },
    );
    const afterDeadband = (0.5 - 0.1) / 0.9;
    expect(value).toBeCloseTo(-0.8 * (0.5 * afterDeadband + 0.5 * afterDeadband ** 3), 12);
  });
});

describe('shaping properties', () => {
  it('maps the centre to 0', () => {
    fc.assert(
      fc.property(calibration, axis, (c, a) => {
        expect(shapeAxis(c.centre, c, a)).toBe(0);
      }),
    );
  });

  it('is monotonic (non-decreasing, non-increasing when reversed)', () => {
    fc.assert(
      fc.property(calibration, axis, raw, raw, fc.boolean(), (c, a, r1, r2, reverse) => {
        const [lo, hi] = r1 <= r2 ? [r1, r2] : [r2, r1];
        const shaped = (r: number) => shapeAxis(r, c, { ...a, reverse });
        if (reverse) expect(shaped(lo)).toBeGreaterThanOrEqual(shaped(hi));
        else expect(shaped(lo)).toBeLessThanOrEqual(shaped(hi));
      }),
    );
  });

  it('is continuous: the output moves no faster than the slopes of its steps allow', () => {
    fc.assert(
      fc.property(calibration, axis, raw, fc.double({ min: -5, max: 5, noNaN: true }), (c, a, r, step) => {
        // Lipschitz bound: calibration 1/min(half span), deadband 1/(1 − d), expo 1 + 2e, rate.
        const bound = (a.rate * (1 + 2 * a.expo)) / ((1 - a.deadband) * Math.min(c.centre - c.low, c.high - c.centre));
        const change = Math.abs(shapeAxis(r + step, c, a) - shapeAxis(r, c, a));
        expect(change).toBeLessThanOrEqual(bound * Math.abs(step) + 1e-12);
      }),
    );
  });

  it('is odd where the calibration is symmetric', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1000, max: 2000, noNaN: true }),
        fc.double({ min: 100, max: 800, noNaN: true }),
        axis,
        fc.double({ min: 0, max: 1000, noNaN: true }),
        (centre, half, a, offset) => {
          const c = { low: centre - half, centre, high: centre + half };
          expect(shapeAxis(centre + offset, c, a)).toBeCloseTo(-shapeAxis(centre - offset, c, a), 12);
        },
      ),
    );
  });

  it('stays within −1..1 for any reading', () => {
    fc.assert(
      fc.property(calibration, axis, fc.double({ noNaN: true }), (c, a, r) => {
        const value = shapeAxis(r, c, a);
        expect(Math.abs(value)).toBeLessThanOrEqual(1);
      }),
    );
  });
});
