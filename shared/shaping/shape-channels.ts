import { STICK_AXES, type StickAxis } from '../schemas/ids';
import type { Channel, RobotConfig } from '../schemas/robot-config';
import type { Sticks } from '../kinematics/mixing';
import { calibrate, shapeAxis } from './input-curves';
import { isArmed, rateSwitchPositions, rateSwitchScale, switchPosition } from './switches';

export type ShapingInput = Pick<RobotConfig, 'controls'> & { safety: Pick<RobotConfig['safety'], 'armingRequired'> };

/** Raw readings keyed by channel number, in the input source's units. */
export type RawByChannel = Record<number, number | undefined>;

export interface ShapedControls {
  sticks: Sticks;
  /** Rate switch position (0 = low end), or null without a rate switch. */
  ratePosition: number | null;
  rateScale: number;
  armed: boolean;
}

function channelOf(config: ShapingInput, number: number | null): Channel | undefined {
  return number === null ? undefined : config.controls.channels.find((c) => c.number === number);
}

/** Calibrated value of a channel, or null when the channel or its reading is missing. */
function readChannel(config: ShapingInput, number: number | null, raw: RawByChannel): number | null {
  const channel = channelOf(config, number);
  const value = number === null ? undefined : raw[number];
  return channel && value !== undefined && Number.isFinite(value) ? calibrate(value, channel) : null;
}

/** Stick commands, rate switch and arming state from one set of raw channel readings. */
export function sticksFromChannels(config: ShapingInput, raw: RawByChannel): ShapedControls {
  const { controls } = config;
  const rateValue = readChannel(config, controls.rateSwitch.channel, raw);
  const ratePosition =
    controls.rateSwitch.channel === null
      ? null
      : switchPosition(rateValue ?? -1, rateSwitchPositions(controls.rateSwitch));
  const rateScale = rateSwitchScale(controls.rateSwitch, ratePosition);
  const sticks = Object.fromEntries(
    STICK_AXES.map((axis) => {
      const map = controls.axes[axis];
      const channel = channelOf(config, map.channel);
      const reading = map.channel === null ? undefined : raw[map.channel];
      // A missing reading is a stick at rest.
      const value = channel && reading !== undefined ? shapeAxis(reading, channel, map, rateScale) : 0;
      return [axis, value];
    }),
  ) as Sticks;
  const armingValue = readChannel(config, controls.armingSwitch.channel, raw);
  return {
    sticks,
    ratePosition,
    rateScale,
    armed: isArmed(controls.armingSwitch, config.safety.armingRequired, armingValue),
  };
}

export type ChannelRole = StickAxis | 'rate-switch' | 'arming-switch' | 'unused';

export class UnknownChannelError extends Error {
  readonly path = ['controls', 'channels'];
}

/**
 * One channel's value after shaping, by the role it plays:
 * - an axis (the first of forward, strafe, yaw that uses it): calibration, reverse, deadband,
 *   expo and rate, without the rate switch (whose position another channel decides), −1..1;
 * - the rate switch: its position, 0 = low end;
 * - the arming switch: 1 when armed, 0 when not;
 * - an unused channel: the calibrated value, −1..1.
 */
export function shapeChannel(
  config: ShapingInput,
  channelNumber: number,
  raw: number,
): { value: number; role: ChannelRole } {
  const { controls } = config;
  const channel = channelOf(config, channelNumber);
  if (!channel)
    throw new UnknownChannelError(`Channel ${channelNumber} is not in the channel table (controls.channels)`);
  const axis = STICK_AXES.find((a) => controls.axes[a].channel === channelNumber);
  if (axis) return { value: shapeAxis(raw, channel, controls.axes[axis]), role: axis };
  const calibrated = calibrate(raw, channel);
  if (controls.rateSwitch.channel === channelNumber) {
    return { value: switchPosition(calibrated, rateSwitchPositions(controls.rateSwitch)), role: 'rate-switch' };
  }
  if (controls.armingSwitch.channel === channelNumber) {
    return {
      value: isArmed(controls.armingSwitch, config.safety.armingRequired, calibrated) ? 1 : 0,
      role: 'arming-switch',
    };
  }
  return { value: calibrated, role: 'unused' };
}
