import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import type { DriverKindId } from '@shared/schemas/ids';
import type { Driver, PinAssignment, RobotConfig } from '@shared/schemas/robot-config';
import type { ClearedPin } from './change-board';

// Edits of the driver list. Each returns a new configuration and keeps it valid for the schema
// (every driver keeps at least one motor); what the pin check would still object to, it shows.

export function updateDriver(config: RobotConfig, index: number, patch: Partial<Driver>): RobotConfig {
  return {
    ...config,
    wiring: { ...config.wiring, drivers: config.wiring.drivers.map((d, i) => (i === index ? { ...d, ...patch } : d)) },
  };
}

/** Motors on no driver channel yet, in the robot's motor order. */
export function freeMotors(config: RobotConfig): string[] {
  const placed = new Set(config.wiring.drivers.flatMap((d) => d.motors));
  return config.motors.map((m) => m.name).filter((name) => !placed.has(name));
}

function unusedName(config: RobotConfig): string {
  const names = new Set(config.wiring.drivers.map((d) => d.name));
  let n = config.wiring.drivers.length + 1;
  while (names.has(`Driver ${n}`)) n += 1;
  return `Driver ${n}`;
}

function emptyPins(kind: DriverKindId, motorCount: number): Record<string, PinAssignment> {
  return Object.fromEntries(driverPinRoles(kind, motorCount).map((r) => [r.id, { pin: null, locked: false }]));
}

/** A driver for the motors not yet on one (as many as the kind has channels); null when none is free. */
export function addDriver(config: RobotConfig, kind?: DriverKindId): RobotConfig | null {
  const free = freeMotors(config);
  if (free.length === 0 || config.wiring.drivers.length >= 8) return null;
  const chosen = kind ?? config.wiring.drivers.at(-1)?.kind ?? 'pwm-in1-in2-stby';
  const motors = free.slice(0, DRIVER_KINDS[chosen].channels);
  const driver: Driver = {
    name: unusedName(config),
    kind: chosen,
    motors,
    pins: emptyPins(chosen, motors.length),
    pwmFrequencyHz: null,
    stopMode: 'brake',
    continuousCurrentA: null,
    peakCurrentA: null,
  };
  return { ...config, wiring: { ...config.wiring, drivers: [...config.wiring.drivers, driver] } };
}

export function removeDriver(config: RobotConfig, index: number): RobotConfig {
  return { ...config, wiring: { ...config.wiring, drivers: config.wiring.drivers.filter((_, i) => i !== index) } };
}

/** Keeps only the pins of roles the driver still has; returns what it dropped. */
function keepKnownPins(
  driver: Driver,
  kind: DriverKindId,
  motorCount: number,
): { pins: Record<string, PinAssignment>; dropped: ClearedPin[] } {
  const roles = driverPinRoles(kind, motorCount);
  const pins: Record<string, PinAssignment> = {};
  for (const role of roles) pins[role.id] = driver.pins[role.id] ?? { pin: null, locked: false };
  const dropped = Object.entries(driver.pins)
    .filter(([id, a]) => a.pin !== null && !roles.some((r) => r.id === id))
    .map(([id, a]) => ({ label: `${driver.name} ${id}`, pin: a.pin! }));
  return { pins, dropped };
}

export interface KindChange {
  config: RobotConfig;
  /** Pins of roles the new kind does not have. */
  dropped: ClearedPin[];
  /** Motors that no longer fit the new kind's channels. */
  unplacedMotors: string[];
}

/**
 * Another kind of driver: pins stay on roles both kinds share (same id, e.g. `a.pwm`), motors
 * beyond the new kind's channels come off, the module ratings go back to the kind's, and a stop
 * mode or PWM frequency the kind cannot do is reset.
 */
export function setDriverKind(config: RobotConfig, index: number, kind: DriverKindId): KindChange {
  const driver = config.wiring.drivers[index];
  const spec = DRIVER_KINDS[kind];
  const motors = driver.motors.slice(0, spec.channels);
  const { pins, dropped } = keepKnownPins(driver, kind, motors.length);
  const stopMode =
    spec.stopModes[driver.stopMode] === null ? (driver.stopMode === 'brake' ? 'coast' : 'brake') : driver.stopMode;
  const pwmFrequencyHz = spec.maxPwmHz === null ? null : driver.pwmFrequencyHz;
  const next = updateDriver(config, index, {
    kind,
    motors,
    pins,
    stopMode,
    pwmFrequencyHz,
    continuousCurrentA: null,
    peakCurrentA: null,
  });
  return { config: next, dropped, unplacedMotors: driver.motors.slice(spec.channels) };
}

/**
 * Puts a motor on one channel (slot 0 = A, 1 = B). A motor taken from another driver swaps with
 * the motor this channel had; null empties channel B (its pins go with it).
 */
export function setChannelMotor(config: RobotConfig, index: number, slot: 0 | 1, motor: string | null): RobotConfig {
  const driver = config.wiring.drivers[index];
  const previous = driver.motors[slot] ?? null;
  if (motor === previous) return config;
  if (motor === null) {
    if (slot === 0) return config;
    const { pins } = keepKnownPins(driver, driver.kind, 1);
    return updateDriver(config, index, { motors: driver.motors.slice(0, 1), pins });
  }
  const holder = config.wiring.drivers.findIndex((d, i) => i !== index && d.motors.includes(motor));
  let next = config;
  if (holder >= 0) {
    const other = config.wiring.drivers[holder];
    // A channel that was empty cannot hand a motor back, so the other driver only loses one
    // when it keeps another.
    if (previous === null && other.motors.length < 2) return config;
    const motors =
      previous === null
        ? other.motors.filter((m) => m !== motor)
        : other.motors.map((m) => (m === motor ? previous : m));
    next = updateDriver(next, holder, { motors, pins: keepKnownPins(other, other.kind, motors.length).pins });
  }
  const motors = [...driver.motors];
  motors[slot] = motor;
  return updateDriver(next, index, { motors, pins: keepKnownPins(driver, driver.kind, motors.length).pins });
}
