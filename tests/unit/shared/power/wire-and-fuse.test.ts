import { describe, expect, it } from 'vitest';
import { summarizeBattery } from '@shared/power/battery';
import { awgToMm2, fuseRatingA, runningCurrentA, wireForCurrent } from '@shared/power/wire-and-fuse';
import { PowerSchema } from '@shared/schemas/robot-config';

describe('wire gauge', () => {
  it('turns AWG into cross-sections that match published gauge tables', () => {
    // ASTM B258 definition d = 0.127 mm × 92^((36 − n)/39); published values: AWG 10 5.26 mm²,
    // AWG 18 0.823 mm², AWG 20 0.518 mm², AWG 24 0.205 mm².
    expect(awgToMm2(10)).toBeCloseTo(5.26, 2);
    expect(awgToMm2(18)).toBeCloseTo(0.823, 3);
    expect(awgToMm2(20)).toBeCloseTo(0.518, 3);
    expect(awgToMm2(24)).toBeCloseTo(0.205, 3);
  });

  it('picks the thinnest gauge whose ampacity covers the current', () => {
    expect(wireForCurrent(3)).toMatchObject({ awg: 24, ampacityA: 3.5 });
    expect(wireForCurrent(10)).toMatchObject({ awg: 20, ampacityA: 11 });
    expect(wireForCurrent(500)).toBeNull();
  });
});

describe('fuse size', () => {
  it('takes half of each stall current as the running current', () => {
    expect(runningCurrentA([2, 2, 3])).toBe(3.5);
  });

  it('rounds 1.25 × the running current up to a standard blade fuse', () => {
    expect(fuseRatingA(2)).toBe(3);
    expect(fuseRatingA(4)).toBe(5);
    expect(fuseRatingA(8)).toBe(10);
    expect(fuseRatingA(40)).toBeNull();
  });
});

describe('battery summary', () => {
  it('gives a 2S LiPo 6.0 / 7.4 / 8.4 V and 44 A at 2200 mAh 20 C', () => {
    // LiPo 3.0–4.2 V per cell (REFERENCES §8); 3.7 V nominal from memory.
    expect(summarizeBattery(PowerSchema.parse({}))).toEqual({
      emptyVolts: 6,
      nominalVolts: 7.4,
      fullVolts: 8.4,
      maxCurrentA: 44,
      isNineVoltBlock: false,
    });
  });

  it('recognises the six-cell alkaline 9 V block', () => {
    expect(summarizeBattery(PowerSchema.parse({ chemistry: 'alkaline', cells: 6 })).isNineVoltBlock).toBe(true);
  });
});
