// TEMPORARY: stands in for shared/kinematics/mixing (computeMixing) and shared/shaping until the
// drive engine lands on main. The wheel row is the general wheel equation of Lynch & Park,
// Modern Robotics (2017), §13.2.1; columns are normalized to peak at ±1 as the engine does.
import type { RobotConfig, Wheel } from '@shared/schemas/robot-config';

export interface Mixing {
  motors: string[];
  /** Per motor [forward, strafe, yaw]; each column peaks at ±1. */
  matrix: number[][];
}

const DEG = Math.PI / 180;

function wheelRow(wheel: Wheel): [number, number, number] {
  const x = wheel.xMm / 1000;
  const y = wheel.yMm / 1000;
  const r = wheel.radiusMm / 1000;
  const gamma = wheel.rollerAngleDeg * DEG;
  const phi = wheel.driveAngleDeg * DEG + gamma;
  const k = (wheel.reversed ? -1 : 1) / (r * Math.cos(gamma));
  return [(x * Math.sin(phi) - y * Math.cos(phi)) * k, Math.cos(phi) * k, Math.sin(phi) * k];
}

export function computeMixing(config: Pick<RobotConfig, 'chassis' | 'motors'>): Mixing {
  const twist = config.motors.map((motor) => {
    const row = [0, 0, 0];
    let weight = 0;
    for (const wheel of config.chassis.wheels.filter((w) => w.motor === motor.name)) {
      const rho = (wheel.maxRpm * 2 * Math.PI) / 60;
      wheelRow(wheel).forEach((h, k) => (row[k] += rho * h));
      weight += rho * rho;
    }
    return weight > 0 ? row.map((v) => v / weight) : row;
  });
  const peak = (k: number) => twist.reduce((p, row) => Math.max(p, Math.abs(row[k])), 0);
  const scale = (k: number) => (peak(k) > 1e-9 ? 1 / peak(k) : 0);
  // Stick columns: forward = +vx, strafe (right) = −vy, yaw (clockwise) = −ω.
  const matrix = twist.map((row) => [row[1] * scale(1), -row[2] * scale(2), -row[0] * scale(0)].map((v) => (Math.abs(v) < 1e-12 ? 0 : v)));
  return { motors: config.motors.map((m) => m.name), matrix };
}
