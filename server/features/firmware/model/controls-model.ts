import { STICK_AXES } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { rateSwitchPositions } from '@shared/shaping/switches';
import type { IssueList } from './firmware-config-error';
import { calibrationSide, q14, q15Unsigned } from './fixed-point';
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
  /** Has a channel (slot >= 0). */
  mapped: boolean;
  slot: number;
  reverse: number;
  deadbandQ: number;
  /** 1 / (1 − deadband), Q15. */
  deadbandScaleQ15: number;
  /** Per rate-switch position: (1 − expo) × rate in Q14 and expo × rate in Q15. */
  linearQ: number[];
  cubicQ15: number[];
}

export interface ControlsModel {
  slots: SlotModel[];
  axes: AxisModel[];
  /** Thresholds on the raw reading ×4: the centre, and half-way from the centre to each end. */
  rateSwitch: { slot: number; positions: number; centre4: number; low4: number; high4: number };
  arming: { slot: number; whenHigh: boolean; required: boolean };
}

// Raw readings are held ×4 in int16: calibration points must stay below 8192.
const MAX_RAW = 8191;

function slotModel(
  config: RobotConfig,
  number: number,
  slot: number,
  input: InputModel,
  issues: IssueList,
): SlotModel | null {
  const index = config.controls.channels.findIndex((c) => c.number === number);
  const channel = config.controls.channels[index];
  if (!channel) return null;
  const values = [channel.low, channel.centre, channel.high];
  if (values.some((v) => v < 0 || v > MAX_RAW)) {
    issues.add(
      ['controls', 'channels', index],
      `Channel ${number}'s end points and centre must be between 0 and ${MAX_RAW}`,
    );
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

/** Where a switch channel changes position (engine: 0 for two positions, ±0.5 for three). */
function switchThresholds(slots: SlotModel[], channel: number | null) {
  const slot = slots.find((s) => s.number === channel);
  if (!slot) return { centre4: 0, low4: 0, high4: 0 };
  return {
    centre4: slot.centre4,
    low4: slot.centre4 - Math.round(slot.lowSpan4 / 2),
    high4: slot.centre4 + Math.round(slot.highSpan4 / 2),
  };
}

export function buildControlsModel(config: RobotConfig, input: InputModel, issues: IssueList): ControlsModel {
  const { controls, safety } = config;
  const used = usedChannelNumbers(config);
  const slots = used.map((n, i) => slotModel(config, n, i, input, issues)).filter((s): s is SlotModel => s !== null);
  const slotOf = (channel: number | null) => (channel === null ? -1 : used.indexOf(channel));
  if (
    controls.axes.forward.channel === null &&
    controls.axes.strafe.channel === null &&
    controls.axes.yaw.channel === null
  ) {
    issues.add(['controls', 'axes'], 'Map at least one stick axis (forward, strafe or yaw) to a channel');
  }
  const rateSwitch = controls.rateSwitch;
  const rates =
    rateSwitch.channel === null ? [1, 1, 1] : [0, 1, 2].map((p) => rateSwitch.rates[p] ?? rateSwitch.rates[0]);
  const axes = STICK_AXES.map((name) => {
    const axis = controls.axes[name];
    return {
      name,
      mapped: axis.channel !== null,
      slot: slotOf(axis.channel),
      reverse: axis.reverse ? 1 : 0,
      deadbandQ: q14(axis.deadband),
      deadbandScaleQ15: q15Unsigned(1 / (1 - axis.deadband)),
      linearQ: rates.map((r) => q14((1 - axis.expo) * axis.rate * r)),
      cubicQ15: rates.map((r) => q15Unsigned(axis.expo * axis.rate * r)),
    };
  });
  if (safety.armingRequired && controls.armingSwitch.channel === null) {
    issues.add(['controls', 'armingSwitch', 'channel'], 'Arming is required: choose the channel of the arming switch');
  }
  return {
    slots,
    axes,
    rateSwitch: {
      slot: slotOf(rateSwitch.channel),
      positions: rateSwitchPositions(rateSwitch),
      ...switchThresholds(slots, rateSwitch.channel),
    },
    arming: {
      slot: slotOf(controls.armingSwitch.channel),
      whenHigh: controls.armingSwitch.armedWhen === 'high',
      required: safety.armingRequired,
    },
  };
}
