/** A motion as fractions of each axis's full scale, in the driver's view (stick signs). */
export interface MotionFractions {
  /** + ahead */
  forward: number;
  /** + to the right */
  strafe: number;
  /** + clockwise seen from above (turning right) */
  yaw: number;
}

/** Below this fraction of full scale a component is not worth mentioning. */
const NOTICEABLE = 0.05;

const percent = (fraction: number) => `${Math.round(Math.abs(fraction) * 100)} %`;

/**
 * Words for a motion, e.g. "drives forward at 50 % and turns right (clockwise) at 20 %",
 * or "spins left (counter-clockwise) on the spot at 30 %".
 */
export function describeMotion(m: MotionFractions): string {
  const parts: string[] = [];
  const moves = Math.abs(m.forward) >= NOTICEABLE || Math.abs(m.strafe) >= NOTICEABLE;
  if (Math.abs(m.forward) >= NOTICEABLE)
    parts.push(`drives ${m.forward > 0 ? 'forward' : 'backward'} at ${percent(m.forward)}`);
  if (Math.abs(m.strafe) >= NOTICEABLE) parts.push(`slides ${m.strafe > 0 ? 'right' : 'left'} at ${percent(m.strafe)}`);
  if (Math.abs(m.yaw) >= NOTICEABLE) {
    const way = m.yaw > 0 ? 'right (clockwise)' : 'left (counter-clockwise)';
    parts.push(moves ? `turns ${way} at ${percent(m.yaw)}` : `spins ${way} on the spot at ${percent(m.yaw)}`);
  }
  if (parts.length === 0) return 'stays still';
  if (parts.length === 1) return parts[0];
  return `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/** True when two motions differ noticeably in any component. */
export function motionsDiffer(a: MotionFractions, b: MotionFractions): boolean {
  return (
    Math.abs(a.forward - b.forward) >= NOTICEABLE ||
    Math.abs(a.strafe - b.strafe) >= NOTICEABLE ||
    Math.abs(a.yaw - b.yaw) >= NOTICEABLE
  );
}
