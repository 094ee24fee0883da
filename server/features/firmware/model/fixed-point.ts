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

/** A factor in Q15 (32768 = 1.0) for an unsigned 16-bit field: 0 up to just under 2. */
export function q15Unsigned(value: number): number {
  const q = Math.round(value * 32768);
  if (q < 0 || q > 65536) throw new Error(`Internal: ${value} does not fit an unsigned Q15 factor`);
  return Math.min(65535, q);
}

/** A signed factor in Q15 for an int16 field: −1..1, with 1.0 held as 32767. */
export function q15Signed(value: number): number {
  const q = Math.round(value * 32768);
  if (Math.abs(q) > 32768) throw new Error(`Internal: ${value} does not fit a signed Q15 factor`);
  return Math.max(-32767, Math.min(32767, q));
}

export interface CalibrationSide {
  /** Span from the centre to this end, in quarter units of the raw reading. */
  span4: number;
  /** value = ((d << shift) × k) >> 16 gives Q14 for d in quarter units, 0 ≤ d < span4. */
  k: number;
  shift: number;
}

/**
 * The shift that brings the span into 16384..32767 (so d << shift still fits 16 bits) and the
 * multiplier 2^30 / (span4 << shift), which then lies in 32768..65535 (unsigned 16 bits): the
 * Q14 result is the high word of one 16 × 16 → 32-bit product.
 */
export function calibrationSide(span4: number): CalibrationSide {
  if (!Number.isInteger(span4) || span4 < 1 || span4 > INT16_MAX)
    throw new Error(`Internal: span ${span4} out of range`);
  let shift = 0;
  while (span4 * 2 ** (shift + 1) <= INT16_MAX) shift++;
  const k = Math.min(65535, Math.round(2 ** 30 / (span4 * 2 ** shift)));
  return { span4, k, shift };
}

/** What the C code computes for one side, for tests that compare it with exact arithmetic. */
export function applyCalibrationSide(side: CalibrationSide, d4: number): number {
  if (d4 >= side.span4) return Q;
  return Math.floor((d4 * 2 ** side.shift * side.k) / 65536);
}
