import { DRIVER_KINDS, driverPinRoles } from './drivers/driver-kinds';
import { INPUT_SOURCES, inputPinRoles } from './inputs/input-sources';
import { computeMixing } from './kinematics/mixing';
import { LAYOUT_LABELS, presetChassis, presetMotors } from './kinematics/presets';
import { STARTER_POWER } from './power/starter-power';
import type { BoardId, DriveLayoutId, DriverKindId, InputSourceId } from './schemas/ids';
import {
  CURRENT_SCHEMA_VERSION,
  RobotConfigSchema,
  type Driver,
  type PinAssignment,
  type RobotConfig,
  type RobotConfigInput,
} from './schemas/robot-config';

export interface StarterOptions {
  layout: DriveLayoutId;
  board?: BoardId;
  input?: InputSourceId;
  driver?: DriverKindId;
  name?: string;
}

/**
 * Which channel drives what in a starter configuration. The common RC channel order puts the
 * right stick's sideways travel on channel 1, its forward travel on 2, the left stick's
 * forward travel (throttle, often not self-centring) on 3 and its sideways travel on 4:
 * so strafe 1, forward 2, yaw 4; channel 3 is left free; the rate switch on 5 and the
 * arming switch on 6 (common practice).
 */
export const STARTER_CHANNELS = { strafe: 1, forward: 2, yaw: 4, rateSwitch: 5, armingSwitch: 6 } as const;

const unassigned = (): PinAssignment => ({ pin: null, locked: false });

/**
 * A complete, valid configuration for a starter layout: every pin left for the pin plan to fill,
 * motors and battery that suit the driver kind (STARTER_POWER), so the power advice starts quiet.
 */
export function buildStarterConfig(options: StarterOptions): RobotConfig {
  const { layout, board = 'uno', input = 'rc-pwm', driver = 'dual-pwm' } = options;
  const chassis = presetChassis(layout);
  const motors = presetMotors(chassis).map((motor) => ({ ...motor, ...STARTER_POWER[driver].motor }));
  const controls = starterControls(input, computeMixing({ chassis, motors }).canStrafe);
  const config: RobotConfigInput = {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: options.name ?? `${LAYOUT_LABELS[layout]} robot`,
    chassis,
    motors,
    controls,
    wiring: {
      board,
      drivers: starterDrivers(
        driver,
        motors.map((m) => m.name),
      ),
      inputPins: Object.fromEntries(
        inputPinRoles(
          input,
          controls.channels.map((c) => c.number),
        ).map((r) => [r.id, unassigned()]),
      ),
    },
    // Motors stay off until the arming switch is on, whenever there is one.
    safety: { armingRequired: controls.armingSwitch.channel !== null },
    power: { ...STARTER_POWER[driver].power },
  };
  return RobotConfigSchema.parse(config);
}

/** Channels with the source's default calibration, mapped as STARTER_CHANNELS says. */
function starterControls(input: InputSourceId, canStrafe: boolean) {
  const source = INPUT_SOURCES[input];
  const ifCarried = (n: number) => (n <= source.maxChannels ? n : null);
  const strafe = canStrafe ? STARTER_CHANNELS.strafe : null;
  const rateChannel = ifCarried(STARTER_CHANNELS.rateSwitch);
  const armingChannel = ifCarried(STARTER_CHANNELS.armingSwitch);
  const roles: [string, number | null][] = [
    ['Strafe', strafe],
    ['Forward', STARTER_CHANNELS.forward],
    ['Yaw', STARTER_CHANNELS.yaw],
    ['Rate switch', rateChannel],
    ['Arming switch', armingChannel],
  ];
  const channels = roles
    .filter((role): role is [string, number] => role[1] !== null)
    .map(([name, number]) => ({ number, name, ...source.defaultCalibration }))
    .sort((a, b) => a.number - b.number);
  return {
    source: input,
    channels,
    axes: {
      forward: { channel: STARTER_CHANNELS.forward },
      strafe: { channel: strafe },
      yaw: { channel: STARTER_CHANNELS.yaw },
    },
    rateSwitch: { channel: rateChannel, rates: [0.5, 1] },
    armingSwitch: { channel: armingChannel, armedWhen: 'high' as const },
    desaturation: 'scale' as const,
  };
}

/** Motors grouped onto drivers in order, as many per driver as the kind has channels. */
export function starterDrivers(kind: DriverKindId, motorNames: string[]): Driver[] {
  const perDriver = DRIVER_KINDS[kind].channels;
  const drivers: Driver[] = [];
  for (let i = 0; i < motorNames.length; i += perDriver) {
    const motors = motorNames.slice(i, i + perDriver);
    drivers.push({
      name: `Driver ${drivers.length + 1}`,
      kind,
      motors,
      pins: Object.fromEntries(driverPinRoles(kind, motors.length).map((role) => [role.id, unassigned()])),
      pwmFrequencyHz: null,
      stopMode: 'brake',
      continuousCurrentA: null,
      peakCurrentA: null,
    });
  }
  return drivers;
}
