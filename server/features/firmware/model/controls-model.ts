import { STICK_AXES } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { IssueList } from './firmware-config-error';
import { calibrationSide, deadbandScaleQ13, q14 } from './fixed-point';
import { usedChannelNumbers, type InputModel } from './input-model';

export interface SlotModel {
  number: number;
  source: number;
  centre4: number;
  lowSpan4: number;
  lowK: number;
  lowShift: number;
  highSpan4: number;
  highK: number;
  highShift: number;
}

export interface AxisModel {
  name: string;
  slot: number;
  reverse: number;
  deadbandQ: number;
  deadbandScaleQ13: number;
  expoQ: number;
  rateQ: number[];
}

export interface ControlsModel {
  slots: SlotModel[];
  axes: AxisModel[];
  rateSwitch: { slot: number; positions: number };
  arming: { slot: number; whenHigh: boolean; required: boolean };
}

// Raw readings are held ×4 in int16: calibration points must stay below 8192.
const MAX_RAW = 8191;

function slotModel(config: RobotConfig, number: number, slot: number, input: InputModel, issues: IssueList): SlotModel | null {
  const index = config.controls.channels.findIndex((c) => c.number === number);
  const channel = config.controls.channels[index];
  if (!channel) return null;
  const values = [channel.low, channel.centre, channel.high];
  if (values.some((v) => v < 0 || v > MAX_RAW)) {
    issues.add(['controls', 'channels', index], `Channel ${number}'s end points and centre must be between 0 and ${MAX_RAW}`);
    return null;
  }
  const [low4, centre4, high4] = values.map((v) => Math.round(v * 4));
  if (!(low4 < centre4 && centre4 < high4)) {
    issues.add(['controls', 'channels', index, 'centre'], `Channel ${number}'s end points are too close to its centre`);
    return null;
  }
  const low = calibrationSide(centre4 - low4);
  const high = calibrationSide(high4 - centre4);
  // rc-pwm decodes each channel on its own wire: the slot is the decoder index; the others carry channel n at n − 1.
  const source = input.isRcPwm ? slot : number - 1;
  return {
    number,
    source,
    centre4,
    lowSpan4: low.span4,
    lowK: low.k,
    lowShift: low.shift,
    highSpan4: high.span4,
    highK: high.k,
    highShift: high.shift,
  };
}

export function buildControlsModel(config: RobotConfig, input: InputModel, issues: IssueList): ControlsModel {
  const { controls, safety } = config;
  const used = usedChannelNumbers(config);
  const slots = used.map((n, i) => slotModel(config, n, i, input, issues)).filter((s): s is SlotModel => s !== null);
  const slotOf = (channel: number | null) => (channel === null ? -1 : used.indexOf(channel));
  if (controls.axes.forward.channel === null && controls.axes.strafe.channel === null && controls.axes.yaw.channel === null) {
    issues.add(['controls', 'axes'], 'Map at least one stick axis (forward, strafe or yaw) to a channel');
  }
  const rateSwitch = controls.rateSwitch;
  const rates = rateSwitch.channel === null ? [1, 1, 1] : [0, 1, 2].map((p) => rateSwitch.rates[p] ?? rateSwitch.rates[0]);
  const axes = STICK_AXES.map((name) => {
    const axis = controls.axes[name];
    return {
      name,
      slot: slotOf(axis.channel),
      reverse: axis.reverse ? 1 : 0,
      deadbandQ: q14(axis.deadband),
      deadbandScaleQ13: deadbandScaleQ13(axis.deadband),
      expoQ: q14(axis.expo),
      rateQ: rates.map((r) => q14(axis.rate * r)),
    };
  });
  if (safety.armingRequired && controls.armingSwitch.channel === null) {
    issues.add(['controls', 'armingSwitch', 'channel'], 'Arming is required: choose the channel of the arming switch');
  }
  return {
    slots,
    axes,
    rateSwitch: { slot: slotOf(rateSwitch.channel), positions: rateSwitch.positions },
    arming: { slot: slotOf(controls.armingSwitch.channel), whenHigh: controls.armingSwitch.armedWhen === 'high', required: safety.armingRequired },
  };
}
