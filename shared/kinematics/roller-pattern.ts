import type { Wheel } from '../schemas/robot-config';
import { normalizeDeg } from './presets';

/**
 * Which way the rollers of a wheel lie, for drawings and the commissioning check.
 *
 * In the wheel equation (Lynch & Park, *Modern Robotics*, §13.2.1) the wheel's speed depends
 * only on the contact velocity along the angle β + γ; the roller touching the ground spins
 * freely about that line, so its axis, seen from above, lies at β + γ (omni: along the
 * driving direction). A roller's axis is fixed in the wheel, so half a turn of the wheel
 * about its axle carries the ground roller to the top and mirrors its axis across the
 * driving direction: the top roller lies at β − γ. A builder looking down sees the top
 * rollers, with the ground rollers mirrored beneath them.
 */
export function groundRollerAngleDeg(wheel: Pick<Wheel, 'driveAngleDeg' | 'rollerAngleDeg'>): number {
  return normalizeLine(wheel.driveAngleDeg + wheel.rollerAngleDeg);
}

/** Axis of the rollers on top of the wheel, seen from above (body frame, CCW from forward). */
export function topRollerAngleDeg(wheel: Pick<Wheel, 'driveAngleDeg' | 'rollerAngleDeg'>): number {
  return normalizeLine(wheel.driveAngleDeg - wheel.rollerAngleDeg);
}

/** A roller axis is a line, not an arrow: angles are folded into (−90°, 90°]. */
function normalizeLine(deg: number): number {
  const a = normalizeDeg(deg);
  if (a > 90) return a - 180;
  if (a <= -90) return a + 180;
  return a;
}

export type RollerPattern = 'x' | 'o' | 'mixed';

/**
 * The pattern the top rollers of the mecanum wheels make seen from above: 'x' when on every
 * wheel the top roller leans from the driving direction the same way as the line from the
 * wheel to the robot's centre (on a square base it points straight at the centre, and the
 * four lines draw an X), 'o' when every one leans the other way (a ring), 'mixed' otherwise;
 * null without mecanum wheels. Angles of lines are compared mod 180° by the sign of sin 2α.
 */
export function rollerPattern(
  wheels: Pick<Wheel, 'kind' | 'xMm' | 'yMm' | 'driveAngleDeg' | 'rollerAngleDeg'>[],
): RollerPattern | null {
  const mecanum = wheels.filter((w) => w.kind === 'mecanum');
  if (mecanum.length === 0) return null;
  const lean = (lineDeg: number, driveDeg: number) => Math.sin((2 * (lineDeg - driveDeg) * Math.PI) / 180);
  const verdicts = mecanum.map((w) => {
    const radial = (Math.atan2(w.yMm, w.xMm) * 180) / Math.PI;
    const roller = lean(topRollerAngleDeg(w), w.driveAngleDeg);
    const centre = lean(radial, w.driveAngleDeg);
    if (Math.abs(roller) < 1e-6 || Math.abs(centre) < 1e-6) return 'mixed';
    return Math.sign(roller) === Math.sign(centre) ? 'x' : 'o';
  });
  return verdicts.every((v) => v === verdicts[0]) ? verdicts[0] : 'mixed';
}
