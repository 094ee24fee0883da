import type { Wheel } from '../schemas/robot-config';
import type { Matrix } from './linear-algebra';

const DEG = Math.PI / 180;

/** The wheel fields the wheel equation reads. */
export type WheelGeometry = Pick<Wheel, 'xMm' | 'yMm' | 'driveAngleDeg' | 'rollerAngleDeg' | 'radiusMm'> & {
  reversed?: boolean;
};

/**
 * One row of H: the wheel's speed (rad/s, positive = the way its motor turns for a
 * positive command) for a body twist V = (ω rad/s, vx m/s, vy m/s).
 *
 * General wheel equation, Lynch & Park, *Modern Robotics* (2017), §13.2.1:
 *   u = [ (x sin(β+γ) − y cos(β+γ))·ω + cos(β+γ)·vx + sin(β+γ)·vy ] / (r cos γ)
 * with (x, y) the contact point, β the driving direction, γ the roller (sliding) angle and
 * r the radius, lengths in metres. Fixed wheels and tracks use γ = 0: their driving
 * equation is the same; their sideways no-slip constraint is what makes a differential
 * or skid-steer layout unable to strafe (its vy column is zero, so the mixing ignores it).
 * A reversed wheel turns backwards for a positive motor command, so its row is negated.
 */
export function wheelRow(wheel: WheelGeometry): [number, number, number] {
  const x = wheel.xMm / 1000;
  const y = wheel.yMm / 1000;
  const r = wheel.radiusMm / 1000;
  const gamma = wheel.rollerAngleDeg * DEG;
  const phi = wheel.driveAngleDeg * DEG + gamma;
  const sign = wheel.reversed ? -1 : 1;
  const k = sign / (r * Math.cos(gamma));
  return [clean((x * Math.sin(phi) - y * Math.cos(phi)) * k), clean(Math.cos(phi) * k), clean(Math.sin(phi) * k)];
}

/** H: one row per wheel, columns [ω, vx, vy]; wheel speeds in rad/s = H · V. */
export function wheelJacobian(wheels: WheelGeometry[]): Matrix {
  return wheels.map(wheelRow);
}

/** Removes the 1e-17 residue of cos 90° so exact zeros stay zeros. */
function clean(value: number): number {
  return Math.abs(value) < 1e-12 ? 0 : value;
}

/** Wheel speed limit in rad/s from its max rpm. */
export function maxWheelRadps(wheel: Pick<Wheel, 'maxRpm'>): number {
  return (wheel.maxRpm * 2 * Math.PI) / 60;
}
