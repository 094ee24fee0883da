/** Commands smaller than this are treated as zero (numerical noise, not a stick move). */
const ZERO = 1e-6;

/**
 * Per-motor output shaping for the start threshold t (the duty below which a motor only hums):
 * 0 stays 0; any other command c maps to sign(c)·(t + (1 − t)·|c|), so the smallest stick move
 * already turns the wheel and full command stays full. Monotonic, within −1..1.
 */
export function applyStartThreshold(command: number, threshold: number): number {
  if (!Number.isFinite(command) || Math.abs(command) < ZERO) return 0;
  const t = Math.max(0, Math.min(threshold, 0.99));
  const magnitude = Math.min(1, Math.abs(command));
  return Math.sign(command) * (t + (1 - t) * magnitude);
}
