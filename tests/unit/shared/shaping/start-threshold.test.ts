import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyStartThreshold } from '@shared/shaping/start-threshold';

const command = fc.double({ min: -1, max: 1, noNaN: true });
const threshold = fc.double({ min: 0, max: 0.6, noNaN: true });

describe('the start threshold', () => {
  it('keeps 0 at 0 and full command at full', () => {
    expect(applyStartThreshold(0, 0.2)).toBe(0);
    expect(applyStartThreshold(1, 0.2)).toBe(1);
    expect(applyStartThreshold(-1, 0.2)).toBe(-1);
  });

  it('jumps a small command past the threshold', () => {
    expect(applyStartThreshold(0.01, 0.25)).toBeCloseTo(0.25 + 0.75 * 0.01, 12);
    expect(applyStartThreshold(-0.01, 0.25)).toBeCloseTo(-(0.25 + 0.75 * 0.01), 12);
  });

  it('gives exactly the output limit at full command and keeps small moves past the threshold', () => {
    expect(applyStartThreshold(1, 0.2, 0.7)).toBeCloseTo(0.7, 12);
    expect(applyStartThreshold(-1, 0.2, 0.7)).toBeCloseTo(-0.7, 12);
    expect(applyStartThreshold(0.01, 0.2, 0.7)).toBeCloseTo(0.2 + 0.5 * 0.01, 12);
  });

  it('runs a motor whose threshold is above the limit at the limit or not at all', () => {
    expect(applyStartThreshold(0.3, 0.5, 0.4)).toBeCloseTo(0.4, 12);
    expect(applyStartThreshold(0, 0.5, 0.4)).toBe(0);
  });

  it('is monotonic, within −1..1, and never between 0 and the threshold', () => {
    fc.assert(
      fc.property(command, command, threshold, (a, b, t) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(applyStartThreshold(lo, t)).toBeLessThanOrEqual(applyStartThreshold(hi, t));
        const out = applyStartThreshold(a, t);
        expect(Math.abs(out)).toBeLessThanOrEqual(1);
        if (out !== 0) expect(Math.abs(out)).toBeGreaterThanOrEqual(t);
        expect(Math.sign(out)).toBe(Math.abs(a) < 1e-6 ? 0 : Math.sign(a));
      }),
    );
  });
});
