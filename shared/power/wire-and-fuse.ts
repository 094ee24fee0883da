/**
 * Fuse and wire sizing, common practice:
 * - A motor works hardest near its maximum-power point, where it draws about half its stall
 *   current (linear DC-motor model: torque and current fall linearly from stall to no load).
 * - The fuse should carry a sustained load without nuisance blowing: at least 1.25 × that
 *   current (the 125 % continuous-load rule of electrical codes), rounded up to a standard
 *   blade-fuse size (from memory: 1, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 35, 40 A).
 * - The wire must outlast the fuse: its ampacity must be at least the fuse rating. Ampacity for
 *   chassis wiring per AWG from the usual published wire-gauge tables (common practice, from memory).
 */
export const BLADE_FUSES_A = [1, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 35, 40];

export const CHASSIS_AMPACITY_A: { awg: number; amps: number }[] = [
  { awg: 26, amps: 2.2 },
  { awg: 24, amps: 3.5 },
  { awg: 22, amps: 7 },
  { awg: 20, amps: 11 },
  { awg: 18, amps: 16 },
  { awg: 16, amps: 22 },
  { awg: 14, amps: 32 },
  { awg: 12, amps: 41 },
  { awg: 10, amps: 55 },
  { awg: 8, amps: 73 },
];

/** AWG to cross-section: d = 0.127 mm × 92^((36 − n) / 39) (ASTM B258 definition of the gauge). */
export function awgToMm2(awg: number): number {
  const d = 0.127 * 92 ** ((36 - awg) / 39);
  return (Math.PI / 4) * d * d;
}

export function runningCurrentA(stallCurrentsA: number[]): number {
  return stallCurrentsA.reduce((sum, a) => sum + a / 2, 0);
}

/** The smallest standard fuse at or above 1.25 × the running current; null above the largest. */
export function fuseRatingA(runningA: number): number | null {
  return BLADE_FUSES_A.find((f) => f >= 1.25 * runningA) ?? null;
}

/** The thinnest gauge whose chassis ampacity covers the current; null when none does. */
export function wireForCurrent(amps: number): { awg: number; mm2: number; ampacityA: number } | null {
  const row = CHASSIS_AMPACITY_A.find((r) => r.amps >= amps);
  return row ? { awg: row.awg, mm2: Math.round(awgToMm2(row.awg) * 1000) / 1000, ampacityA: row.amps } : null;
}
