import type { AxisMap, Channel } from '../schemas/robot-config';

// Input shaping, one step at a time. Every step is continuous and monotonic (non-decreasing),
// maps 0 to 0 and keeps −1..1 within −1..1, so their chain has the same properties.

export type Calibration = Pick<Channel, 'low' | 'centre' | 'high'>;

/**
 * Raw channel value (µs, counts) → −1..1. Each side of the centre is scaled on its own, so a
 * receiver with uneven end points (say 1020 / 1500 / 1960 µs) still reaches ±1 at both ends.
 */
export function calibrate(raw: number, c: Calibration): number {
  if (!Number.isFinite(raw)) return 0;
  const x = raw >= c.centre ? (raw - c.centre) / (c.high - c.centre) : (raw - c.centre) / (c.centre - c.low);
  return Math.max(-1, Math.min(1, x));
}

/**
 * Deadband with rescaling: |x| ≤ d reads as 0, and the rest of the travel is stretched so the
 * output grows from 0 at the deadband edge to ±1 at the end (no jump at the edge).
 */
export function applyDeadband(x: number, deadband: number): number {
  const d = Math.max(0, Math.min(deadband, 0.99));
  const magnitude = Math.abs(x);
  if (magnitude <= d) return 0;
  return (Math.sign(x) * (magnitude - d)) / (1 - d);
}

/**
 * Expo: y = (1 − e)·x + e·x³ (common practice in RC transmitters): gentle round the centre,
 * still ±1 at the ends; e = 0 is linear, e = 1 fully cubic. Slope 1 − e + 3e·x² ≥ 0, so it
 * stays monotonic for e in 0..1.
 */
export function applyExpo(x: number, expo: number): number {
  const e = Math.max(0, Math.min(expo, 1));
  return (1 - e) * x + e * x * x * x;
}

/** Rate: the output at full stick. */
export function applyRate(x: number, rate: number): number {
  return x * rate;
}

/**
 * One stick axis: calibration → reverse → deadband → expo → rate (× the rate switch's scale).
 * The result is in −1..1.
 */
export function shapeAxis(
  raw: number,
  calibration: Calibration,
  axis: Pick<AxisMap, 'reverse' | 'deadband' | 'expo' | 'rate'>,
  rateScale = 1,
): number {
  let x = calibrate(raw, calibration);
  if (axis.reverse) x = -x;
  x = applyDeadband(x, axis.deadband);
  x = applyExpo(x, axis.expo);
  const y = applyRate(x, axis.rate * rateScale);
  return y === 0 ? 0 : y;
}
