import { STICK_AXES, type StickAxis } from '../schemas/ids';
import type { Wheel } from '../schemas/robot-config';
import { multiply, pseudoInverse, type Matrix } from './linear-algebra';
import { describeMotion, motionsDiffer, type MotionFractions } from './motion-words';
import { maxWheelRadps, wheelRow } from './wheel-equation';

/** Stick commands in −1..1: forward + = ahead, strafe + = right, yaw + = turn right (clockwise). */
export type Sticks = Record<StickAxis, number>;
export type DesaturationMode = 'scale' | 'clip';
/** The parts of a configuration the mixing reads. */
export interface MixingInput {
  chassis: { wheels: Wheel[] };
  motors: { name: string }[];
}

export interface Mixing {
  /** Motor names, in the configuration's order (the rows of `matrix`). */
  motors: string[];
  /** Per motor [forward, strafe, yaw]: command for a full stick; each column peaks at ±1. */
  matrix: number[][];
  /** Rank of the map from body motion to motor commands (3 = moves and turns freely). */
  rank: number;
  canStrafe: boolean;
  canTurn: boolean;
  canDrive: boolean;
  /** Body speeds at full stick (0 for an axis the layout cannot do, whose stick is ignored). */
  fullScale: { forwardMps: number; strafeMps: number; yawRadps: number };
  /** Degeneracy and sharing problems, in words. */
  notes: string[];
  /** Motor command per unit body twist, columns [ω rad/s, vx m/s, vy m/s]. */
  twistMatrix: Matrix;
  /** Pseudo-inverse of `twistMatrix` (3 × motors): body twist from motor commands. */
  twistInverse: Matrix;
  /** Body speed per unit of each axis, also for an ignored axis (used to put motion in words). */
  axisScale: { forwardMps: number; strafeMps: number; yawRadps: number };
}

/** What a motor must do per unit body twist: the least-squares fit over the wheels it drives. */
export function motorTwistRows(input: MixingInput): Matrix {
  return input.motors.map((motor) => {
    const wheels = input.chassis.wheels.filter((w) => w.motor === motor.name);
    const row = [0, 0, 0];
    let weight = 0;
    for (const wheel of wheels) {
      // Wheel speed = command · ρ (ρ = its top speed in rad/s), and should equal H_i · V.
      const rho = maxWheelRadps(wheel);
      wheelRow(wheel).forEach((h, k) => (row[k] += rho * h));
      weight += rho * rho;
    }
    return weight > 0 ? row.map((v) => v / weight) : row;
  });
}

const columnPeak = (m: Matrix, k: number) => m.reduce((peak, row) => Math.max(peak, Math.abs(row[k])), 0);

/** The normalized mixing matrix, rank and degeneracy of a configuration. */
export function computeMixing(input: MixingInput): Mixing {
  const twistMatrix = motorTwistRows(input);
  const overall = Math.max(columnPeak(twistMatrix, 0), columnPeak(twistMatrix, 1), columnPeak(twistMatrix, 2));
  const scaleOf = (k: number) => {
    const peak = columnPeak(twistMatrix, k);
    return peak > overall * 1e-9 && peak > 0 ? 1 / peak : 0;
  };
  const axisScale = { forwardMps: scaleOf(1), strafeMps: scaleOf(2), yawRadps: scaleOf(0) };
  // Stick columns: forward = +vx, strafe (right) = −vy, yaw (clockwise) = −ω.
  const natural = twistMatrix.map((row) => [
    row[1] * axisScale.forwardMps,
    -row[2] * axisScale.strafeMps,
    -row[0] * axisScale.yawRadps,
  ]);
  const { inverse, rank } = pseudoInverse(natural, 3);
  const projection = multiply(inverse, natural);
  const scales = [axisScale.forwardMps, axisScale.strafeMps, axisScale.yawRadps];
  const achievable = STICK_AXES.map((_, k) => scales[k] > 0 && Math.abs(projection[k][k] - 1) < 1e-6);
  const matrix = natural.map((row) => row.map((v, k) => (achievable[k] ? tidy(v) : 0)));
  const mixing: Mixing = {
    motors: input.motors.map((m) => m.name),
    matrix,
    rank,
    canDrive: achievable[0],
    canStrafe: achievable[1],
    canTurn: achievable[2],
    fullScale: {
      forwardMps: achievable[0] ? axisScale.forwardMps : 0,
      strafeMps: achievable[1] ? axisScale.strafeMps : 0,
      yawRadps: achievable[2] ? axisScale.yawRadps : 0,
    },
    notes: [],
    twistMatrix,
    twistInverse: pseudoInverse(twistMatrix, 3).inverse,
    axisScale,
  };
  mixing.notes = degeneracyNotes(mixing, natural);
  return mixing;
}

function tidy(v: number): number {
  return Math.abs(v) < 1e-12 ? 0 : v;
}

const AXIS_WORDS: Record<StickAxis, { noun: string; cannot: string }> = {
  forward: { noun: 'forward', cannot: 'cannot drive forward or backward' },
  strafe: { noun: 'strafe', cannot: 'cannot move sideways' },
  yaw: { noun: 'yaw', cannot: 'cannot turn on the spot' },
};

function degeneracyNotes(mixing: Mixing, natural: Matrix): string[] {
  if (mixing.rank === 0)
    return ['No motor can move this robot: check the wheel positions, driving directions and motors.'];
  const can = { forward: mixing.canDrive, strafe: mixing.canStrafe, yaw: mixing.canTurn };
  return STICK_AXES.filter((axis) => !can[axis]).map((axis) => {
    const k = STICK_AXES.indexOf(axis);
    const base = `This layout ${AXIS_WORDS[axis].cannot}; the ${AXIS_WORDS[axis].noun} stick is ignored by design.`;
    const column = natural.map((row) => row[k]);
    if (column.every((v) => Math.abs(v) < 1e-12)) return base;
    const motion = forwardKinematics(mixing, column);
    return `${base} Asked to, its wheels would only make it ${motion.words}.`;
  });
}

const clampStick = (v: number) => (Number.isFinite(v) ? Math.max(-1, Math.min(1, v)) : 0);

/**
 * Brings commands back within −1..1. `scale` divides all by the largest magnitude, so the
 * ratios between motors (the direction of travel) are kept; `clip` cuts each at ±1, which
 * bends the path (a fast turn while driving loses part of the turn).
 */
export function desaturate(commands: number[], mode: DesaturationMode = 'scale'): number[] {
  if (mode === 'clip') return commands.map((c) => Math.max(-1, Math.min(1, c)));
  let peak = 0;
  for (const c of commands) peak = Math.max(peak, Math.abs(c));
  return peak > 1 ? commands.map((c) => c / peak) : [...commands];
}

/** Motor commands (mixing.motors order) for stick commands, after desaturation. */
export function mixSticks(mixing: Mixing, sticks: Sticks, mode: DesaturationMode = 'scale'): number[] {
  const f = clampStick(sticks.forward);
  const s = clampStick(sticks.strafe);
  const y = clampStick(sticks.yaw);
  const raw = mixing.matrix.map((row) => row[0] * f + row[1] * s + row[2] * y);
  return desaturate(raw, mode);
}

export interface BodyMotion {
  /** The stick commands that best explain the motor commands (least squares). */
  sticks: Sticks;
  twist: { vxMps: number; vyMps: number; omegaRadps: number };
  /** Share (0..1) of the commands that no body motion explains: the wheels work against each other. */
  fighting: number;
  words: string;
}

/** Body motion from motor commands, by the pseudo-inverse (least squares, minimum norm). */
export function forwardKinematics(mixing: Mixing, commands: number[]): BodyMotion {
  const [omega, vx, vy] = mixing.twistInverse.map((row) => row.reduce((sum, v, j) => sum + v * (commands[j] ?? 0), 0));
  const explained = mixing.twistMatrix.map((row) => row[0] * omega + row[1] * vx + row[2] * vy);
  const norm = Math.hypot(...commands);
  const miss = Math.hypot(...commands.map((c, i) => c - explained[i]));
  const { forwardMps, strafeMps, yawRadps } = mixing.axisScale;
  const sticks: Sticks = {
    forward: forwardMps > 0 ? vx / forwardMps : 0,
    strafe: strafeMps > 0 ? -vy / strafeMps : 0,
    yaw: yawRadps > 0 ? -omega / yawRadps : 0,
  };
  const fighting = norm > 1e-12 ? miss / norm : 0;
  const words = describeMotion(sticks) + (fighting > 0.25 ? ', with its wheels working against each other' : '');
  return { sticks, twist: { vxMps: vx, vyMps: vy, omegaRadps: omega }, fighting, words };
}

export interface ReversalCase {
  axis: StickAxis;
  /** False when the layout ignores this stick. */
  applicable: boolean;
  intended: string;
  result: BodyMotion;
  changed: boolean;
  sentence: string;
}

const GERUND: Record<StickAxis, string> = {
  forward: 'driving forward',
  strafe: 'sliding right',
  yaw: 'spinning right (clockwise)',
};

/** What each full stick would do if `motorName` turned the other way ("spins instead of strafing"). */
export function whatIfReversed(
  input: MixingInput,
  motorName: string,
): { motor: string; cases: ReversalCase[]; summary: string } {
  const mixing = computeMixing(input);
  const index = mixing.motors.indexOf(motorName);
  if (index < 0) throw new Error(`No motor is named "${motorName}"`);
  const cases = STICK_AXES.map((axis): ReversalCase => {
    const unit: MotionFractions = { forward: 0, strafe: 0, yaw: 0, [axis]: 1 };
    const label = `${axis.charAt(0).toUpperCase()}${axis.slice(1)} stick`;
    const commands = mixSticks(mixing, unit);
    const applicable = commands.some((c) => c !== 0);
    commands[index] = -commands[index];
    const result = forwardKinematics(mixing, commands);
    const changed = applicable && (motionsDiffer(result.sticks, unit) || result.fighting > 0.25);
    const sentence = !applicable
      ? `${label}: ignored on this layout.`
      : changed
        ? `${label}: instead of ${GERUND[axis]}, the robot ${result.words}.`
        : `${label}: no noticeable change.`;
    return { axis, applicable, intended: describeMotion(unit), result, changed, sentence };
  });
  const changed = cases.filter((c) => c.changed);
  const summary = changed.length
    ? `If ${motorName} turned the other way: ${changed.map((c) => c.sentence).join(' ')}`
    : `Reversing ${motorName} would change nothing noticeable.`;
  return { motor: motorName, cases, summary };
}
