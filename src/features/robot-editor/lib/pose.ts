/** Where the robot is on the floor: metres and radians, world x = the robot's first forward, y = its first left. */
export interface Pose {
  xM: number;
  yM: number;
  /** Heading, counter-clockwise from world x. */
  thetaRad: number;
}

export interface Twist {
  vxMps: number;
  vyMps: number;
  omegaRadps: number;
}

export const START_POSE: Pose = { xM: 0, yM: 0, thetaRad: 0 };

/**
 * Moves a pose by a body twist held for `dtS` seconds. Exact for a constant twist: the body
 * velocity (vx, vy) turns with the heading θ(t) = θ₀ + ωt, so its world integral is
 * ∫R(θ)v dt with ∫cos θ dt = (sin θ₁ − sin θ₀)/ω and ∫sin θ dt = (cos θ₀ − cos θ₁)/ω
 * (the planar rigid-body exponential, as in Lynch & Park, *Modern Robotics*, §13.4).
 */
export function integratePose(pose: Pose, twist: Twist, dtS: number): Pose {
  const { vxMps: vx, vyMps: vy, omegaRadps: w } = twist;
  const t0 = pose.thetaRad;
  const t1 = t0 + w * dtS;
  if (Math.abs(w * dtS) < 1e-9) {
    return {
      xM: pose.xM + (vx * Math.cos(t0) - vy * Math.sin(t0)) * dtS,
      yM: pose.yM + (vx * Math.sin(t0) + vy * Math.cos(t0)) * dtS,
      thetaRad: t1,
    };
  }
  const s = Math.sin(t1) - Math.sin(t0);
  const c = Math.cos(t0) - Math.cos(t1);
  return {
    xM: pose.xM + (vx * s - vy * c) / w,
    yM: pose.yM + (vx * c + vy * s) / w,
    thetaRad: t1,
  };
}
