/** Commands smaller than this are treated as zero (numerical noise, not a stick move). */
const ZERO = 1e-6;

/**
 * The output stage of every motor: the start threshold t (the duty below which that motor
 * only hums) inside the output limit L. 0 stays 0; any other command c maps to
 * sign(c)·(t + (L − t)·|c|), so the smallest stick move already turns the wheel and full
 * command gives exactly the limit — the limit is never exceeded, and a limit below 100 %
 * does not push small moves back under the threshold. A threshold at or above the limit
 * leaves only the limit (the motor runs at L or not at all).
 */
export function applyStartThreshold(command: number, threshold: number, limit = 1): number {
  if (!Number.isFinite(command) || Math.abs(command) < ZERO) return 0;
  const cap = Math.max(0, Math.min(limit, 1));
  const t = Math.max(0, Math.min(threshold, 0.99, cap));
  const magnitude = Math.min(1, Math.abs(command));
  return Math.sign(command) * (t + (cap - t) * magnitude);
}
