import { describe, expect, it } from 'vitest';
import { fieldChanges } from '@shared/history/field-path';
import { makeConfig } from '../../../factories/engine';

describe('fieldChanges', () => {
  it('finds nothing between a configuration and its copy', () => {
    expect(fieldChanges(makeConfig(), structuredClone(makeConfig()))).toEqual([]);
  });

  it('reports a changed field by its path with the old and new value', () => {
    const after = makeConfig('quad-mecanum', (c) => (c.chassis.wheels[2].radiusMm = 35));
    expect(fieldChanges(makeConfig(), after)).toEqual([
      { path: ['chassis', 'wheels', 2, 'radiusMm'], before: makeConfig().chassis.wheels[2].radiusMm, after: 35 },
    ]);
  });

  it('compares a list of plain values as one value', () => {
    expect(fieldChanges({ rates: [0.5, 1] }, { rates: [0.5, 0.8, 1] })).toEqual([
      { path: ['rates'], before: [0.5, 1], after: [0.5, 0.8, 1] },
    ]);
  });

  it('reports an item present on one side only as one change', () => {
    expect(fieldChanges({ w: [{ n: 1 }] }, { w: [{ n: 1 }, { n: 2 }] })).toEqual([
      { path: ['w', 1], before: undefined, after: { n: 2 } },
    ]);
  });

  it('reports a key on one side only as one change of its whole value', () => {
    const before = { pins: { 'a.pwm': { pin: 'D9' } } };
    const after = { pins: { 'b.pwm': { pin: 'D10' } } };
    expect(fieldChanges(before, after)).toEqual([
      { path: ['pins', 'a.pwm'], before: { pin: 'D9' }, after: undefined },
      { path: ['pins', 'b.pwm'], before: undefined, after: { pin: 'D10' } },
    ]);
  });
});
