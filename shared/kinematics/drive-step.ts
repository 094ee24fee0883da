import { STICK_AXES, type StickAxis } from '../schemas/ids';
import type { RobotConfig } from '../schemas/robot-config';
import { shapeAxis, type Calibration } from '../shaping/input-curves';
import { applyStartThreshold } from '../shaping/start-threshold';
import { rateSwitchScale } from '../shaping/switches';
import { computeMixing, forwardKinematics, mixSticks, type BodyMotion, type Mixing, type Sticks } from './mixing';

/** The parts of a configuration one control step reads. */
export type DriveStepInput = Pick<RobotConfig, 'chassis' | 'motors' | 'controls' | 'safety'>;

export interface DriveStepOptions {
  /** The configuration's mixing, when the caller keeps it between steps (it is the same every step). */
  mixing?: Mixing;
  /** Rate switch position (0 = low end); null or missing reads as the lowest rate, like the engine. */
  ratePosition?: number | null;
  /** Ramp limit: the commands of the previous step and the time since it, in seconds. */
  ramp?: { previous: number[]; dtS: number };
}

export interface DriveStep {
  /** Stick positions after deadband, expo and rate (an axis mapped to no channel reads 0). */
  shapedSticks: Sticks;
  /** Motor commands after mixing and desaturation, in `mixing.motors` order. */
  targets: number[];
  /** Commands after the ramp limit (the targets when no ramp is asked for); feed them back next step. */
  ramped: number[];
  /** Ramped commands scaled by the output limit: the share of each motor's top speed asked for. */
  limited: number[];
  /** What the drivers get: signed duty in −1..1, after the start threshold. */
  outputs: number[];
  /** Body motion that forward kinematics gives for `limited` (see below). */
  motion: BodyMotion;
  /** Axes the step ignored: mapped to no channel, or a motion the layout cannot make. */
  ignoredAxes: StickAxis[];
}

/** The on-screen stick or gamepad value is already calibrated: −1..1 with 0 at rest. */
const UNIT_CALIBRATION: Calibration = { low: -1, centre: 0, high: 1 };

/**
 * One control step, in the order the generated firmware runs it:
 * shaping (deadband → expo → rate × rate switch) → mixing → desaturation → ramp →
 * output limit → start threshold.
 *
 * `sticks` are the driver's intent, already calibrated and the right way round (an on-screen
 * stick or a gamepad), so channel calibration and `reverse`, which correct a transmitter's
 * channel, are not applied. The output limit caps each motor's speed and the start threshold
 * then lifts any non-zero duty past the motor's dead zone (the duty where it only hums), so
 * the wheel turns at about the limited command: body motion comes from `limited`, not from
 * the duty the drivers get.
 */
export function driveStep(config: DriveStepInput, sticks: Sticks, options: DriveStepOptions = {}): DriveStep {
  const mixing = options.mixing ?? computeMixing(config);
  const { controls, safety } = config;
  const rateScale = rateSwitchScale(controls.rateSwitch, options.ratePosition ?? null);
  const mapped = (axis: StickAxis) => {
    const channel = controls.axes[axis].channel;
    return channel !== null && controls.channels.some((c) => c.number === channel);
  };
  const shapedSticks = Object.fromEntries(
    STICK_AXES.map((axis) => {
      const map = controls.axes[axis];
      const value = mapped(axis) ? shapeAxis(sticks[axis], UNIT_CALIBRATION, { ...map, reverse: false }, rateScale) : 0;
      return [axis, value];
    }),
  ) as Sticks;
  const targets = mixSticks(mixing, shapedSticks, controls.desaturation);
  const ramped = options.ramp
    ? rampToward(options.ramp.previous, targets, safety.rampPerSecond * options.ramp.dtS)
    : [...targets];
  const limit = safety.outputLimitPercent / 100;
  const limited = ramped.map((c) => c * limit);
  const thresholds = mixing.motors.map((name) => config.motors.find((m) => m.name === name)?.startThreshold ?? 0);
  const outputs = ramped.map((c, i) => applyStartThreshold(c, thresholds[i], limit));
  const can: Record<StickAxis, boolean> = { forward: mixing.canDrive, strafe: mixing.canStrafe, yaw: mixing.canTurn };
  const ignoredAxes = STICK_AXES.filter((axis) => !mapped(axis) || !can[axis]);
  return { shapedSticks, targets, ramped, limited, outputs, motion: forwardKinematics(mixing, limited), ignoredAxes };
}

/**
 * Moves each command toward its target by at most `maxStep` (the ramp limit: full scale per
 * second × the step's duration). A missing previous command counts as stopped.
 */
export function rampToward(previous: number[], targets: number[], maxStep: number): number[] {
  const step = Math.max(0, maxStep);
  return targets.map((target, i) => {
    const now = previous[i] ?? 0;
    if (target > now + step) return now + step;
    if (target < now - step) return now - step;
    return target;
  });
}
