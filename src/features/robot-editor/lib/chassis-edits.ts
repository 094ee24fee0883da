import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import { presetChassis, PRESET_PARAM_SCHEMAS } from '@shared/kinematics/presets';
import type { ChassisLayout, DriveLayoutId } from '@shared/schemas/ids';
import { MotorSchema, type Driver, type RobotConfig, type Wheel } from '@shared/schemas/robot-config';
import { starterDrivers } from '@shared/starter';

// Edits of the chassis that touch more than one field: the motors follow the wheels, and the
// drivers follow the motors, so the configuration stays whole while the builder works.

/** A driver's pins fitted to its motors: roles it no longer has are dropped, new ones left unassigned. */
export function fitDriverPins(driver: Driver): Driver {
  const roles = driverPinRoles(driver.kind, driver.motors.length);
  return {
    ...driver,
    pins: Object.fromEntries(roles.map((r) => [r.id, driver.pins[r.id] ?? { pin: null, locked: false }])),
  };
}

/**
 * Motors and drivers brought in line with the wheel table. `renames` maps old motor names to
 * new ones (a renamed motor keeps its settings and its place on a driver). Motors no wheel uses
 * are dropped, new ones get a free driver channel (or a new driver) and the ratings of the robot's
 * first motor: drive motors are usually alike, and a new one should not clash with the drivers
 * and battery chosen for the others.
 */
export function syncMotors(config: RobotConfig, renames: Readonly<Record<string, string>> = {}): RobotConfig {
  const names = [...new Set(config.chassis.wheels.map((w) => w.motor))];
  const settings = new Map(config.motors.map((m) => [renames[m.name] ?? m.name, m]));
  const like = config.motors[0];
  const fresh = (name: string) =>
    MotorSchema.parse(like ? { name, stallCurrentA: like.stallCurrentA, ratedVoltage: like.ratedVoltage } : { name });
  const motors = names.map((name) => ({ ...(settings.get(name) ?? fresh(name)), name }));
  // Each motor keeps the first channel it is found on; merged motors free the others.
  const seen = new Set<string>();
  const keep = (m: string) => names.includes(m) && !seen.has(m) && (seen.add(m), true);
  let drivers = config.wiring.drivers
    .map((d) => ({ ...d, motors: d.motors.map((m) => renames[m] ?? m).filter(keep) }))
    .filter((d) => d.motors.length > 0);
  const placed = new Set(drivers.flatMap((d) => d.motors));
  for (const name of names.filter((n) => !placed.has(n)))
    drivers = placeOnDriver(drivers, name, config.wiring.drivers[0]?.kind);
  return { ...config, motors, wiring: { ...config.wiring, drivers: drivers.map(fitDriverPins) } };
}

function placeOnDriver(drivers: Driver[], motor: string, kind: Driver['kind'] | undefined): Driver[] {
  const free = drivers.findIndex((d) => d.motors.length < DRIVER_KINDS[d.kind].channels);
  if (free >= 0) return drivers.map((d, i) => (i === free ? { ...d, motors: [...d.motors, motor] } : d));
  const [added] = starterDrivers(kind ?? 'dual-pwm', [motor]);
  const taken = new Set(drivers.map((d) => d.name));
  let n = drivers.length + 1;
  while (taken.has(`Driver ${n}`)) n += 1;
  return [...drivers, { ...added, name: `Driver ${n}` }];
}

/** Picks a new chassis layout. A starter layout brings its own wheels; "custom" keeps the current table to edit. */
export function changeLayout(config: RobotConfig, layout: ChassisLayout): RobotConfig {
  if (layout === config.chassis.layout) return config;
  if (layout === 'custom') return { ...config, chassis: { ...config.chassis, layout: 'custom', params: {} } };
  const chassis = presetChassis(layout);
  // Motors are renamed in order, so each keeps its settings and its place on a driver.
  const oldMotors = config.motors.map((m) => m.name);
  const newMotors = [...new Set(chassis.wheels.map((w) => w.motor))];
  const renames = Object.fromEntries(oldMotors.slice(0, newMotors.length).map((name, i) => [name, newMotors[i]]));
  return syncMotors({ ...config, chassis }, renames);
}

/**
 * New parameters for the starter layout: the wheel table is built again. Wheels are matched by
 * position in the table; each keeps its reversed flag, and its name and motor if the builder
 * had changed them from the layout's own.
 */
export function changeParams(config: RobotConfig, params: Record<string, number | string>): RobotConfig {
  const layout = config.chassis.layout as DriveLayoutId;
  const before = presetChassis(layout, PRESET_PARAM_SCHEMAS[layout].parse(config.chassis.params) as never).wheels;
  const after = presetChassis(layout, params as never);
  const renames: Record<string, string> = {};
  const wheels = after.wheels.map((fresh, i): Wheel => {
    const old = config.chassis.wheels[i];
    if (!old || !before[i]) return fresh;
    const motor = old.motor === before[i].motor ? fresh.motor : old.motor;
    if (motor !== old.motor) renames[old.motor] = motor;
    return { ...fresh, name: old.name === before[i].name ? fresh.name : old.name, motor, reversed: old.reversed };
  });
  return syncMotors({ ...config, chassis: { ...after, wheels } }, renames);
}

/** A new wheel on its own new motor, like the last wheel but at the centre, for the builder to place. */
export function addWheel(config: RobotConfig): RobotConfig {
  const last = config.chassis.wheels[config.chassis.wheels.length - 1];
  const taken = new Set([...config.chassis.wheels.map((w) => w.name), ...config.motors.map((m) => m.name)]);
  let n = config.chassis.wheels.length + 1;
  while (taken.has(`Wheel ${n}`)) n += 1;
  const name = `Wheel ${n}`;
  const wheel: Wheel = {
    name,
    kind: last?.kind ?? 'omni',
    xMm: 0,
    yMm: 0,
    driveAngleDeg: 0,
    rollerAngleDeg: 0,
    radiusMm: last?.radiusMm ?? 30,
    motor: name,
    reversed: false,
    maxRpm: last?.maxRpm ?? 200,
  };
  return syncMotors({ ...config, chassis: { ...config.chassis, wheels: [...config.chassis.wheels, wheel] } });
}

export function removeWheel(config: RobotConfig, index: number): RobotConfig {
  if (config.chassis.wheels.length <= 1) return config;
  return syncMotors({
    ...config,
    chassis: { ...config.chassis, wheels: config.chassis.wheels.filter((_, i) => i !== index) },
  });
}

export type RenameResult = { ok: true; config: RobotConfig } | { ok: false; reason: string };

/** Renames a motor everywhere it is named: its wheels and its driver channel. */
export function renameMotor(config: RobotConfig, index: number, name: string): RenameResult {
  const old = config.motors[index]?.name;
  const next = name.trim();
  if (old === undefined || next === old) return { ok: true, config };
  if (!next) return { ok: false, reason: 'Give the motor a name' };
  if (next.length > 40) return { ok: false, reason: 'At most 40 characters' };
  if (config.motors.some((m, i) => i !== index && m.name === next))
    return { ok: false, reason: `Another motor is already named “${next}”` };
  return {
    ok: true,
    config: {
      ...config,
      motors: config.motors.map((m, i) => (i === index ? { ...m, name: next } : m)),
      chassis: {
        ...config.chassis,
        wheels: config.chassis.wheels.map((w) => (w.motor === old ? { ...w, motor: next } : w)),
      },
      wiring: {
        ...config.wiring,
        drivers: config.wiring.drivers.map((d) => ({ ...d, motors: d.motors.map((m) => (m === old ? next : m)) })),
      },
    },
  };
}
