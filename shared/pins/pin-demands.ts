import { DRIVER_KINDS, driverPinRoles } from '../drivers/driver-kinds';
import { inputPinRoles, remotePinRoles } from '../inputs/input-sources';
import type { PinAssignment, RobotConfig } from '../schemas/robot-config';

/** Everything a pin may be asked to do, across drivers, inputs, the status LED and the remote. */
export type PinNeed =
  | 'pwm'
  | 'digital-out'
  | 'servo-pulse'
  | 'interrupt'
  | 'external-interrupt'
  | 'uart-rx'
  | 'analog-in'
  | 'switch-in'
  | 'led';

export const NEED_WORDS: Record<PinNeed, string> = {
  pwm: 'PWM',
  'digital-out': 'a digital output',
  'servo-pulse': 'servo pulses',
  interrupt: 'an interrupt (external or pin-change)',
  'external-interrupt': 'an external interrupt',
  'uart-rx': 'a serial receive line',
  'analog-in': 'an analog input',
  'switch-in': 'a digital input with a pull-up',
  led: 'a digital output',
};

/** Which board a demand's pin is on: the robot's, or the handheld remote's (home-made link). */
export type PlanSide = 'robot' | 'remote';

/** One pin role that needs a pin. */
export interface PinDemand {
  /** Unique within a configuration: 'driver:0:a.pwm', 'input:ch1', 'status-led', 'remote:ce'. */
  key: string;
  side: PlanSide;
  owner: 'driver' | 'input' | 'status-led' | 'bench-test' | 'remote';
  driverIndex: number | null;
  roleId: string;
  /** As Problem.roles shows it: 'Left front/a.pwm', 'input/ch1', 'status-led', 'remote/ce'. */
  roleName: string;
  /** For sentences: 'Left front A PWM', 'input channel 1 pulse'. */
  label: string;
  need: PinNeed;
  /** An unassigned required role is an error. */
  required: boolean;
  /** Demands with the same non-null group may share one pin (a chip kind's standby line). */
  shareGroup: string | null;
  /** PWM frequency the role asks for (null = board default); servo pulses ask for 50 Hz. */
  requestedHz: number | null;
  /** Highest frequency the driver accepts on this role. */
  ceilingHz: number;
  pin: string | null;
  locked: boolean;
  path: (string | number)[];
}

/** "Channel 1 pulse" → "channel 1 pulse", but "PPM signal" stays. */
function lowerFirst(text: string): string {
  return /^[A-Z][a-z]/.test(text) ? text.charAt(0).toLowerCase() + text.slice(1) : text;
}

/** Servo pulses repeat every 20 ms (REFERENCES §5). */
export const SERVO_PULSE_HZ = 50;

function assignment(record: Record<string, PinAssignment>, id: string): { pin: string | null; locked: boolean } {
  const a = record[id];
  return { pin: a?.pin ?? null, locked: a?.locked ?? false };
}

function driverDemands(config: RobotConfig): PinDemand[] {
  return config.wiring.drivers.flatMap((driver, index) => {
    const kind = DRIVER_KINDS[driver.kind];
    return driverPinRoles(driver.kind, driver.motors.length).map((role): PinDemand => ({
      key: `driver:${index}:${role.id}`,
      side: 'robot',
      owner: 'driver',
      driverIndex: index,
      roleId: role.id,
      roleName: `${driver.name}/${role.id}`,
      label: `${driver.name} ${role.label}`,
      need: role.need,
      required: !role.optional,
      shareGroup: role.shareable ? `${driver.kind}:${role.id}` : null,
      requestedHz: role.need === 'servo-pulse' ? SERVO_PULSE_HZ : role.need === 'pwm' ? driver.pwmFrequencyHz : null,
      ceilingHz: kind.maxPwmHz ?? Infinity,
      ...assignment(driver.pins, role.id),
      path: ['wiring', 'drivers', index, 'pins', role.id, 'pin'],
    }));
  });
}

function inputDemands(config: RobotConfig): PinDemand[] {
  const numbers = config.controls.channels.map((c) => c.number).sort((a, b) => a - b);
  return inputPinRoles(config.controls.source, numbers).map((role): PinDemand => ({
    key: `input:${role.id}`,
    side: 'robot',
    owner: 'input',
    driverIndex: null,
    roleId: role.id,
    roleName: `input/${role.id}`,
    label: lowerFirst(role.label),
    need: role.need,
    required: true,
    shareGroup: null,
    requestedHz: null,
    ceilingHz: Infinity,
    ...assignment(config.wiring.inputPins, role.id),
    path: ['wiring', 'inputPins', role.id, 'pin'],
  }));
}

function singleDemand(config: RobotConfig, which: 'status-led' | 'bench-test'): PinDemand {
  const a = which === 'status-led' ? config.wiring.statusLed : config.wiring.benchTestPin;
  return {
    key: which,
    side: 'robot',
    owner: which,
    driverIndex: null,
    roleId: which,
    roleName: which,
    label: which === 'status-led' ? 'status LED' : 'bench-test switch',
    need: which === 'status-led' ? 'led' : 'switch-in',
    required: false,
    shareGroup: null,
    requestedHz: null,
    ceilingHz: Infinity,
    pin: a.pin,
    locked: a.locked,
    path: ['wiring', which === 'status-led' ? 'statusLed' : 'benchTestPin', 'pin'],
  };
}

function remoteDemands(config: RobotConfig): PinDemand[] {
  if (config.controls.source !== 'nrf24') return [];
  return remotePinRoles(config.controls).map((role): PinDemand => ({
    key: `remote:${role.id}`,
    side: 'remote',
    owner: 'remote',
    driverIndex: null,
    roleId: role.id,
    roleName: `remote/${role.id}`,
    label: `remote ${lowerFirst(role.label)}`,
    need: role.need,
    required: true,
    shareGroup: null,
    requestedHz: null,
    ceilingHz: Infinity,
    ...assignment(config.controls.link.remotePins, role.id),
    path: ['controls', 'link', 'remotePins', role.id, 'pin'],
  }));
}

/** Every pin role of the configuration, robot side first, in a stable order. */
export function collectDemands(config: RobotConfig): PinDemand[] {
  return [
    ...driverDemands(config),
    ...inputDemands(config),
    singleDemand(config, 'status-led'),
    singleDemand(config, 'bench-test'),
    ...remoteDemands(config),
  ];
}

/** Input pins kept under roles the current input source does not have (left over after a change). */
export function strayInputRoles(config: RobotConfig): { roleId: string; pin: string; remote: boolean }[] {
  const numbers = config.controls.channels.map((c) => c.number);
  const known = new Set(inputPinRoles(config.controls.source, numbers).map((r) => r.id));
  const remoteKnown = new Set(
    config.controls.source === 'nrf24' ? remotePinRoles(config.controls).map((r) => r.id) : [],
  );
  const stray = (record: Record<string, PinAssignment>, keep: Set<string>, remote: boolean) =>
    Object.entries(record)
      .filter(([roleId, a]) => a.pin !== null && !keep.has(roleId))
      .map(([roleId, a]) => ({ roleId, pin: a.pin!, remote }));
  return [
    ...stray(config.wiring.inputPins, known, false),
    ...stray(config.controls.link.remotePins, remoteKnown, true),
  ];
}

/** Role ids stored on a driver that its kind does not have (left over after a kind change). */
export function strayDriverRoles(config: RobotConfig): { driverIndex: number; roleId: string }[] {
  return config.wiring.drivers.flatMap((driver, driverIndex) => {
    const known = new Set(driverPinRoles(driver.kind, driver.motors.length).map((r) => r.id));
    return Object.entries(driver.pins)
      .filter(([roleId, a]) => !known.has(roleId) && a.pin !== null)
      .map(([roleId]) => ({ driverIndex, roleId }));
  });
}
