import { multiply, pseudoInverse } from './linear-algebra';
import { computeMixing, forwardKinematics, mixSticks, type MixingInput } from './mixing';

export interface EnvelopeSample {
  /** Direction of travel in the body frame, counter-clockwise from forward (90° = left). */
  headingDeg: number;
  /** Top speed the wheels allow in this heading without turning (0 where the layout cannot go). */
  speedMps: number;
  /** Speed with the sticks pushed fully in this heading, after mixing and desaturation. */
  fullStickMps: number;
}

export interface MotionEnvelope {
  samples: EnvelopeSample[];
  topSpeedMps: number;
  /** Top spin rate on the spot (0 if the layout cannot turn). */
  topYawRadps: number;
}

/**
 * Top body speed in each heading and top yaw rate, from the wheels' top speeds: in heading
 * θ the twist (0, cos θ, sin θ)·s needs motor commands s·A·d, so s = 1 / max|A·d|, provided
 * the layout can move that way at all (d lies in the row space of A).
 */
export function motionEnvelope(input: MixingInput, samples = 360): MotionEnvelope {
  const mixing = computeMixing(input);
  const a = mixing.twistMatrix;
  const projection = multiply(pseudoInverse(a, 3).inverse, a);
  const reach = (d: number[]) => {
    const projected = projection.map((row) => row.reduce((sum, v, k) => sum + v * d[k], 0));
    if (Math.hypot(...projected.map((v, k) => v - d[k])) > 1e-6) return 0;
    const peak = Math.max(...a.map((row) => Math.abs(row[0] * d[0] + row[1] * d[1] + row[2] * d[2])));
    return peak > 1e-12 ? 1 / peak : 0;
  };
  const count = Math.max(1, Math.floor(samples));
  const list = Array.from({ length: count }, (_, i): EnvelopeSample => {
    const headingDeg = (360 * i) / count;
    const theta = (headingDeg * Math.PI) / 180;
    const speedMps = reach([0, Math.cos(theta), Math.sin(theta)]);
    return { headingDeg, speedMps, fullStickMps: fullStickSpeed(mixing, theta) };
  });
  return {
    samples: list,
    topSpeedMps: Math.max(...list.map((s) => s.speedMps)),
    topYawRadps: reach([1, 0, 0]),
  };
}

function fullStickSpeed(mixing: ReturnType<typeof computeMixing>, theta: number): number {
  const { forwardMps, strafeMps } = mixing.fullScale;
  // Heading θ means vx ∝ cos θ and vy ∝ sin θ; strafe right is −vy.
  let forward = forwardMps > 0 ? Math.cos(theta) / forwardMps : 0;
  let strafe = strafeMps > 0 ? -Math.sin(theta) / strafeMps : 0;
  const wantsForward = Math.abs(Math.cos(theta)) > 1e-9;
  const wantsSideways = Math.abs(Math.sin(theta)) > 1e-9;
  if ((wantsForward && forwardMps === 0) || (wantsSideways && strafeMps === 0)) return 0;
  const edge = Math.max(Math.abs(forward), Math.abs(strafe));
  forward /= edge;
  strafe /= edge;
  const motion = forwardKinematics(mixing, mixSticks(mixing, { forward, strafe, yaw: 0 }, 'scale'));
  return Math.hypot(motion.twist.vxMps, motion.twist.vyMps);
}
