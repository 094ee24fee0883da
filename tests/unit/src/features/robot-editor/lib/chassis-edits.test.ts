import { describe, expect, it } from 'vitest';
import {
  addWheel,
  changeLayout,
  changeParams,
  removeWheel,
  renameMotor,
  syncMotors,
} from '@/features/robot-editor/lib/chassis-edits';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';

const trio = () => buildStarterConfig({ layout: 'trio-omni', driver: 'pwm-in1-in2-stby' });
const mecanum = () => buildStarterConfig({ layout: 'quad-mecanum', driver: 'pwm-in1-in2-stby' });
const valid = (config: RobotConfig) => RobotConfigSchema.safeParse(config).success;

describe('changeParams', () => {
  it('rebuilds the wheel table from the new parameters', () => {
    const config = mecanum();
    const next = changeParams(config, { ...config.chassis.params, wheelbaseMm: 200 });
    expect(next.chassis.wheels.map((w) => w.xMm)).toEqual([100, 100, -100, -100]);
    expect(next.chassis.params.wheelbaseMm).toBe(200);
  });

  it('keeps each wheel’s reversed flag and a name the builder gave it', () => {
    const config = mecanum();
    config.chassis.wheels[1] = { ...config.chassis.wheels[1], name: 'Starboard bow', reversed: true };
    const next = changeParams(config, { ...config.chassis.params, trackWidthMm: 250 });
    expect(next.chassis.wheels[1]).toMatchObject({ name: 'Starboard bow', reversed: true, yMm: -125 });
    expect(next.chassis.wheels[0]).toMatchObject({ name: 'Front left', reversed: false });
  });

  it('follows the layout’s own names when a choice moves the wheels', () => {
    const config = trio();
    const next = changeParams(config, { ...config.chassis.params, loneWheel: 'rear' });
    expect(next.chassis.wheels[0].name).toBe('Rear');
    expect(next.motors.map((m) => m.name)).toEqual(next.chassis.wheels.map((w) => w.motor));
    expect(next.wiring.drivers.flatMap((d) => d.motors).sort()).toEqual(next.motors.map((m) => m.name).sort());
    expect(valid(next)).toBe(true);
  });

  it('merges motors when a skid steer goes to one motor per side, keeping drivers whole', () => {
    const config = buildStarterConfig({ layout: 'skid-steer', driver: 'dual-pwm' });
    const next = changeParams(config, { ...config.chassis.params, motorsPerSide: 1 });
    expect(next.motors.map((m) => m.name)).toEqual(['Left', 'Right']);
    expect(next.wiring.drivers.flatMap((d) => d.motors).sort()).toEqual(['Left', 'Right']);
    expect(valid(next)).toBe(true);
  });
});

describe('changeLayout', () => {
  it('keeps the table when switching to a custom wheel table', () => {
    const config = mecanum();
    const next = changeLayout(config, 'custom');
    expect(next.chassis.layout).toBe('custom');
    expect(next.chassis.wheels).toEqual(config.chassis.wheels);
  });

  it('renames motors in order onto the new layout, so each keeps its settings and driver channel', () => {
    const config = trio();
    config.motors[0] = { ...config.motors[0], stallCurrentA: 4.5 };
    const firstDriver = config.wiring.drivers[0];
    const next = changeLayout(config, 'quad-mecanum');
    expect(next.motors[0]).toMatchObject({ name: 'Front left', stallCurrentA: 4.5 });
    expect(next.wiring.drivers[0]).toMatchObject({ name: firstDriver.name, motors: ['Front left', 'Front right'] });
    expect(next.wiring.drivers.flatMap((d) => d.motors)).toHaveLength(4);
    expect(valid(next)).toBe(true);
  });

  it('drops drivers left without a motor when the new layout has fewer', () => {
    const next = changeLayout(mecanum(), 'differential');
    expect(next.wiring.drivers).toHaveLength(1);
    expect(next.wiring.drivers[0].motors).toEqual(['Left', 'Right']);
    expect(Object.keys(next.wiring.drivers[0].pins).some((k) => k.startsWith('b.'))).toBe(true);
  });
});

describe('wheels and motors', () => {
  it('adds a wheel with its own motor on a free driver channel', () => {
    const config = changeLayout(trio(), 'custom');
    const next = addWheel(config);
    expect(next.chassis.wheels).toHaveLength(4);
    expect(next.motors.map((m) => m.name)).toContain('Wheel 4');
    expect(next.wiring.drivers[1].motors).toEqual([config.wiring.drivers[1].motors[0], 'Wheel 4']);
    expect(valid(next)).toBe(true);
  });

  it('gives a new motor the ratings of the robot’s motors, so the power advice stays quiet', () => {
    const config = changeLayout(trio(), 'custom');
    const next = addWheel({
      ...config,
      motors: config.motors.map((m) => ({ ...m, stallCurrentA: 0.8, ratedVoltage: 4.5 })),
    });
    expect(next.motors.find((m) => m.name === 'Wheel 4')).toMatchObject({ stallCurrentA: 0.8, ratedVoltage: 4.5 });
  });

  it('removes a wheel and the motor that only it used', () => {
    const config = changeLayout(mecanum(), 'custom');
    const next = removeWheel(config, 3);
    expect(next.motors.map((m) => m.name)).not.toContain('Rear left');
    expect(next.wiring.drivers.flatMap((d) => d.motors)).not.toContain('Rear left');
    expect(valid(next)).toBe(true);
  });

  it('keeps the last wheel', () => {
    const config = buildStarterConfig({ layout: 'differential' });
    expect(removeWheel(removeWheel(config, 0), 0).chassis.wheels).toHaveLength(1);
  });

  it('renames a motor on its wheels and its driver channel', () => {
    const result = renameMotor(mecanum(), 2, 'Back right');
    if (!result.ok) throw new Error(result.reason);
    expect(result.config.chassis.wheels[2].motor).toBe('Back right');
    expect(result.config.wiring.drivers[1].motors).toEqual(['Back right', 'Rear left']);
    expect(valid(result.config)).toBe(true);
  });

  it('refuses a motor name another motor has', () => {
    expect(renameMotor(mecanum(), 0, 'Rear left')).toEqual({
      ok: false,
      reason: 'Another motor is already named “Rear left”',
    });
  });

  it('drops a motor no wheel uses', () => {
    const config = mecanum();
    config.chassis.wheels[3] = { ...config.chassis.wheels[3], motor: 'Rear right' };
    const next = syncMotors(config);
    expect(next.motors.map((m) => m.name)).toEqual(['Front left', 'Front right', 'Rear right']);
  });
});
