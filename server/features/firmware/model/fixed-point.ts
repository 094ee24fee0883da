// Fixed-point constants for the generated control step. Q14: 16384 = 1.0. Every constant is
// checked to fit the C type the template declares (int16_t), so no value can overflow on a
// board with 16-bit int.

export const Q = 16384;
const INT16_MAX = 32767;

export function q14(value: number): number {
  const q = Math.round(value * Q);
  if (Math.abs(q) > INT16_MAX) throw new Error(`Internal: ${value} does not fit Q14 in 16 bits`);
  return q;
}

/** 1 / (1 − d) in Q13 (8192 = 1.0): at most 16384 for a deadband up to 0.5. */
export function deadbandScaleQ13(deadband: number): number {
  return Math.round(8192 / (1 - deadband));
}

export interface CalibrationSide {
  /** Span from the centre to this end, in quarter units of the raw reading. */
  span4: number;
  /** value = d × k >> shift gives Q14 for d in quarter units, 0 ≤ d ≤ span4. */
  k: number;
  shift: number;
}

/**
 * The multiplier and shift for one side of a channel: the largest shift whose multiplier
 * still fits int16 (best precision), and no more than 17 so d × k stays within int32
 * (d ≤ span4, so d × k ≤ about 16384 × 2^shift).
 */
export function calibrationSide(span4: number): CalibrationSide {
  if (!Number.isInteger(span4) || span4 < 1 || span4 > INT16_MAX) throw new Error(`Internal: span ${span4} out of range`);
  for (let shift = 17; shift >= 0; shift--) {
    const k = Math.round((Q * 2 ** shift) / span4);
    if (k <= INT16_MAX) return { span4, k, shift };
  }
  throw new Error(`Internal: no multiplier for span ${span4}`);
}

/** What the C code computes for one side, for tests that compare against the engine. */
export function applyCalibrationSide(side: CalibrationSide, d4: number): number {
  if (d4 >= side.span4) return Q;
  return Math.floor((d4 * side.k) / 2 ** side.shift);
}
