import { describe, expect, it } from 'vitest';
import { rebaseDraft, rebaseRows } from '@shared/history/rebase-draft';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { robotConfig } from '../../../factories/robot-config';

const channel = (number: number, name: string) => ({ number, name, low: 1000, centre: 1500, high: 2000 });

/** A base revision, a newer revision by someone else, and my draft from the base. */
function threeWay() {
  const base = robotConfig();
  const theirs = structuredClone(base);
  theirs.safety.failsafeTimeoutMs = 150;
  theirs.chassis.wheels[0].radiusMm = 32;
  const mine = structuredClone(base);
  mine.safety.rampPerSecond = 6;
  mine.chassis.wheels[0].radiusMm = 31;
  return { base, theirs, mine };
}

describe('rebaseRows', () => {
  it('says who changed each field since the base revision', () => {
    const { base, theirs, mine } = threeWay();
    const rows = rebaseRows(base, theirs, mine);
    const byKey = Object.fromEntries(rows.map((r) => [r.key, r]));
    expect(byKey['safety.failsafeTimeoutMs']).toMatchObject({
      origin: 'theirs',
      suggested: 'theirs',
      from: '150 ms',
      to: '250 ms',
    });
    expect(byKey['safety.rampPerSecond']).toMatchObject({ origin: 'mine', suggested: 'mine' });
    expect(byKey['chassis.wheels.0.radiusMm']).toMatchObject({ origin: 'both', suggested: 'mine', baseWords: '30 mm' });
  });
});

describe('rebaseDraft', () => {
  it('keeps their changes and mine by default', () => {
    const { base, theirs, mine } = threeWay();
    const next = rebaseDraft(theirs, rebaseRows(base, theirs, mine), {});
    expect(next.safety.failsafeTimeoutMs).toBe(150);
    expect(next.safety.rampPerSecond).toBe(6);
    expect(next.chassis.wheels[0].radiusMm).toBe(31);
  });

  it('takes their value where the person chose theirs', () => {
    const { base, theirs, mine } = threeWay();
    const next = rebaseDraft(theirs, rebaseRows(base, theirs, mine), {
      'chassis.wheels.0.radiusMm': 'theirs',
      'safety.rampPerSecond': 'theirs',
    });
    expect(next.chassis.wheels[0].radiusMm).toBe(32);
    expect(next.safety.rampPerSecond).toBe(4);
  });

  it('keeps my value where the person chose mine over theirs', () => {
    const { base, theirs, mine } = threeWay();
    const next = rebaseDraft(theirs, rebaseRows(base, theirs, mine), { 'safety.failsafeTimeoutMs': 'mine' });
    expect(next.safety.failsafeTimeoutMs).toBe(250);
  });

  it('adds the item I added to their list', () => {
    const { base, theirs } = threeWay();
    const mine = structuredClone(base);
    mine.controls.channels.push({ number: 5, name: 'Rate', low: 1000, centre: 1500, high: 2000 });
    const next = rebaseDraft(theirs, rebaseRows(base, theirs, mine), {});
    expect(next.controls.channels.map((c) => c.number)).toEqual([1, 2, 5]);
    expect(RobotConfigSchema.safeParse(next).success).toBe(true);
  });

  it('leaves the newer revision untouched', () => {
    const { base, theirs, mine } = threeWay();
    const copy = structuredClone(theirs);
    rebaseDraft(theirs, rebaseRows(base, theirs, mine), {});
    expect(theirs).toEqual(copy);
  });

  it('keeps their added item and my changed field in the same list', () => {
    const base = robotConfig();
    const theirs = structuredClone(base);
    theirs.controls.channels.push(channel(3, 'Mode'));
    const mine = structuredClone(base);
    mine.controls.channels[0].centre = 1520;
    const next = rebaseDraft(theirs, rebaseRows(base, theirs, mine), {});
    expect(next.controls.channels.map((c) => [c.number, c.centre])).toEqual([
      [1, 1520],
      [2, 1500],
      [3, 1500],
    ]);
  });

  it('takes out the items I removed when the person keeps mine', () => {
    const base = robotConfig();
    base.controls.channels.push(channel(3, 'Mode'), channel(4, 'Horn'));
    const mine = structuredClone(base);
    mine.controls.channels.splice(2);
    const next = rebaseDraft(structuredClone(base), rebaseRows(base, base, mine), {});
    expect(next.controls.channels.map((c) => c.number)).toEqual([1, 2]);
  });

  it('appends a later item of mine even when an earlier one is left out', () => {
    const base = robotConfig();
    const mine = structuredClone(base);
    mine.controls.channels.push(channel(3, 'Mode'), channel(4, 'Horn'));
    const next = rebaseDraft(base, rebaseRows(base, base, mine), { 'controls.channels.2': 'theirs' });
    expect(next.controls.channels.map((c) => c.number)).toEqual([1, 2, 4]);
  });
});
