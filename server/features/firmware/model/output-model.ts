import type { DriverKindId } from '@shared/schemas/ids';
import type { Driver, RobotConfig } from '@shared/schemas/robot-config';
import { CHANNEL_PREFIXES, DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import { cString, macroPart } from '../c-text';
import type { IssueList } from './firmware-config-error';
import { q14, q15Signed } from './fixed-point';
import type { PinRegistry } from './pin-registry';

export interface MotorModel {
  index: number;
  /** The motor's mixing sum in C, from its Q15 row (see mixExpression). */
  mixExpression: string;
  nameLiteral: string;
  row: number[];
  thresholdQ: number;
  driveCall: string;
  stopCall: string;
}

export interface MotorWiring {
  motorIndex: number;
  driverIndex: number;
  /** Pin macro per role key of the driver kind (absent optional roles are missing). */
  pins: Record<string, string>;
  pwmPins: { macro: string; pinId: string }[];
}

export const DRIVER_HEADERS: Record<DriverKindId, string> = {
  'dual-pwm': 'mw_driver_dual_pwm.h',
  'pwm-dir': 'mw_driver_pwm_dir.h',
  'en-in1-in2': 'mw_driver_en_in1_in2.h',
  'pwm-in1-in2-stby': 'mw_driver_pwm_in1_in2_stby.h',
  'two-input': 'mw_driver_two_input.h',
  'servo-esc': 'mw_driver_servo_esc.h',
};

/** Argument lists of each kind's functions, in the order the driver headers declare them. */
const ARGUMENTS: Record<DriverKindId, string[]> = {
  'dual-pwm': ['fwd', 'rev', 'en'],
  'pwm-dir': ['pwm', 'dir'],
  'en-in1-in2': ['en', 'in1', 'in2'],
  'pwm-in1-in2-stby': ['pwm', 'in1', 'in2'],
  'two-input': ['in1', 'in2'],
  'servo-esc': [],
};

const FUNCTION_PREFIX: Record<DriverKindId, string> = {
  'dual-pwm': 'mw_dual_pwm',
  'pwm-dir': 'mw_pwm_dir',
  'en-in1-in2': 'mw_en_in1_in2',
  'pwm-in1-in2-stby': 'mw_pwm_in1_in2_stby',
  'two-input': 'mw_two_input',
  'servo-esc': 'mw_servo_esc',
};

/**
 * The C expression summing one motor's mixing terms: a zero entry is left out, ±1.0 (held as
 * ±32767) becomes an addition or subtraction of the stick, anything else one scaled product.
 */
export function mixExpression(motor: number, row: number[]): string {
  const terms = row.flatMap((q, k) => {
    if (q === 0) return [];
    if (q === 32767) return [`+ s[${k}]`];
    if (q === -32767) return [`- s[${k}]`];
    return [`+ mw_scale_signed(s[${k}], MW_MIX[${motor}][${k}])`];
  });
  if (terms.length === 0) return '0';
  return `(int32_t)0 ${terms.join(' ')}`;
}

/** Which driver and channel each motor is on; issues for motors on none or on two. */
function motorPlacement(config: RobotConfig, issues: IssueList): Map<number, { driver: number; channel: number }> {
  const placed = new Map<number, { driver: number; channel: number }>();
  config.wiring.drivers.forEach((driver, d) => {
    const spec = DRIVER_KINDS[driver.kind];
    driver.motors.forEach((name, channel) => {
      const path = ['wiring', 'drivers', d, 'motors', channel];
      const m = config.motors.findIndex((motor) => motor.name === name);
      if (m < 0) issues.add(path, `No motor is named "${name}"`);
      else if (channel >= spec.channels)
        issues.add(path, `A ${spec.name} drives ${spec.channels} motor(s); "${name}" has no channel`);
      else if (placed.has(m)) issues.add(path, `Motor "${name}" is already on another driver`);
      else placed.set(m, { driver: d, channel });
    });
  });
  config.motors.forEach((motor, m) => {
    if (!placed.has(m)) issues.add(['wiring', 'drivers'], `Motor "${motor.name}" is not connected to any driver`);
  });
  return placed;
}

function wireMotor(config: RobotConfig, m: number, d: number, channel: number, pins: PinRegistry): MotorWiring {
  const driver = config.wiring.drivers[d];
  const spec = DRIVER_KINDS[driver.kind];
  const motor = config.motors[m];
  const prefix = CHANNEL_PREFIXES[channel];
  const result: MotorWiring = { motorIndex: m, driverIndex: d, pins: {}, pwmPins: [] };
  for (const role of spec.channelRoles) {
    const roleId = `${prefix}.${role.key}`;
    const macro = `MW_PIN_M${m}_${macroPart(motor.name, 'MOTOR')}_${role.key.toUpperCase()}`;
    const path = ['wiring', 'drivers', d, 'pins', roleId, 'pin'];
    const entry = pins.use(
      driver.pins[roleId]?.pin,
      path,
      macro,
      `${role.label} of motor ${motor.name}`,
      driver.name,
      !role.optional,
    );
    if (!entry) continue;
    result.pins[role.key] = macro;
    if (role.need === 'pwm') result.pwmPins.push({ macro, pinId: entry.pinId });
  }
  return result;
}

function callsFor(kind: DriverKindId, wiring: MotorWiring, servoSlot: number, driver: Driver) {
  const fn = FUNCTION_PREFIX[kind];
  if (kind === 'servo-esc') {
    return { drive: `${fn}_drive(${servoSlot}, direction, duty)`, stop: `${fn}_stop(${servoSlot})`, setup: null };
  }
  const args = ARGUMENTS[kind].map((key) => wiring.pins[key] ?? '-1').join(', ');
  const brake = driver.stopMode === 'brake' ? 1 : 0;
  return {
    drive: `${fn}_drive(${args}, direction, duty)`,
    stop: `${fn}_stop(${args}, ${brake})`,
    setup: `${fn}_setup(${args})`,
  };
}

export interface OutputModel {
  motors: MotorModel[];
  wiring: MotorWiring[];
  driverHeaders: string[];
  outputSetup: string[];
  servoPinMacros: string[];
}

export function buildOutputModel(
  config: RobotConfig,
  matrix: number[][],
  pins: PinRegistry,
  issues: IssueList,
): OutputModel {
  const placed = motorPlacement(config, issues);
  const motors: MotorModel[] = [];
  const wiring: MotorWiring[] = [];
  const outputSetup: string[] = [];
  const servoPinMacros: string[] = [];
  config.motors.forEach((motor, m) => {
    const place = placed.get(m);
    const row = (matrix[m] ?? [0, 0, 0]).map((v) => q15Signed(Math.max(-1, Math.min(1, v))));
    const base = {
      index: m,
      mixExpression: mixExpression(m, row),
      nameLiteral: cString(motor.name),
      row,
      thresholdQ: q14(Math.min(motor.startThreshold, 0.99, config.safety.outputLimitPercent / 100)),
    };
    if (!place) {
      motors.push({ ...base, driveCall: '(void)direction; (void)duty', stopCall: '(void)0' });
      return;
    }
    const driver = config.wiring.drivers[place.driver];
    const wired = wireMotor(config, m, place.driver, place.channel, pins);
    wiring.push(wired);
    const servoSlot = driver.kind === 'servo-esc' ? servoPinMacros.length : -1;
    if (servoSlot >= 0 && wired.pins.signal) servoPinMacros.push(wired.pins.signal);
    const calls = callsFor(driver.kind, wired, servoSlot, driver);
    if (calls.setup) outputSetup.push(calls.setup);
    motors.push({ ...base, driveCall: calls.drive, stopCall: calls.stop });
  });
  config.wiring.drivers.forEach((driver, d) => {
    for (const role of DRIVER_KINDS[driver.kind].chipRoles) {
      const macro = `MW_PIN_DRV${d}_${macroPart(driver.name, 'DRIVER')}_${role.id.toUpperCase()}`;
      const path = ['wiring', 'drivers', d, 'pins', role.id, 'pin'];
      if (pins.use(driver.pins[role.id]?.pin, path, macro, role.label, driver.name, !role.optional)) {
        outputSetup.push(`mw_pwm_in1_in2_stby_standby(${macro})`);
      }
    }
  });
  const kinds = [...new Set(config.wiring.drivers.map((d) => d.kind))];
  return { motors, wiring, driverHeaders: kinds.map((k) => DRIVER_HEADERS[k]), outputSetup, servoPinMacros };
}
