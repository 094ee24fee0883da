import { describe, expect, it } from 'vitest';
import { presetChassis } from '@shared/kinematics/presets';
import { groundRollerAngleDeg, rollerPattern, topRollerAngleDeg } from '@shared/kinematics/roller-pattern';
import { makeWheel } from '../../../factories/engine';

describe('roller lines seen from above', () => {
  // Modern Robotics §13.2.1: the ground roller's free axis lies at β + γ; half a wheel turn mirrors it
  // across the driving direction, so the top roller lies at β − γ.
  it('mirrors the top rollers of a mecanum wheel across its driving direction', () => {
    const wheel = makeWheel({ kind: 'mecanum', driveAngleDeg: 0, rollerAngleDeg: -45 });
    expect(groundRollerAngleDeg(wheel)).toBe(-45);
    expect(topRollerAngleDeg(wheel)).toBe(45);
  });

  it('folds a roller line into (−90°, 90°] because a line has no arrow', () => {
    expect(topRollerAngleDeg(makeWheel({ driveAngleDeg: 150, rollerAngleDeg: 0 }))).toBe(-30);
    expect(groundRollerAngleDeg(makeWheel({ driveAngleDeg: -90, rollerAngleDeg: 0 }))).toBe(90);
  });

  it('finds the X pattern on the starter mecanum chassis', () => {
    expect(rollerPattern(presetChassis('quad-mecanum', { rollers: 'x' }).wheels)).toBe('x');
  });

  it('finds the O pattern when every roller is mirrored', () => {
    expect(rollerPattern(presetChassis('quad-mecanum', { rollers: 'o' }).wheels)).toBe('o');
  });

  it('keeps calling a long, narrow X base an X', () => {
    expect(
      rollerPattern(presetChassis('quad-mecanum', { rollers: 'x', wheelbaseMm: 400, trackWidthMm: 120 }).wheels),
    ).toBe('x');
  });

  it('reports a mixed pattern when one wheel is fitted the wrong way round', () => {
    const wheels = presetChassis('quad-mecanum').wheels.map((w, i) =>
      i === 0 ? { ...w, rollerAngleDeg: -w.rollerAngleDeg } : w,
    );
    expect(rollerPattern(wheels)).toBe('mixed');
  });

  it('has no pattern without mecanum wheels', () => {
    expect(rollerPattern(presetChassis('quad-omni-x').wheels)).toBeNull();
  });
});
