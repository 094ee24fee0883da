import { describe, expect, it } from 'vitest';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { rawConfig } from '../../../factories/engine';

/** The paths of the validation issues, as dotted strings. */
function issuePaths(value: unknown): string[] {
  const result = RobotConfigSchema.safeParse(value);
  expect(result.success).toBe(false);
  return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
}

describe('invalid configurations', () => {
  it('accepts the starter it is broken from', () => {
    expect(RobotConfigSchema.safeParse(rawConfig()).success).toBe(true);
  });

  it('names chassis.wheels when there are no wheels', () => {
    const config = rawConfig();
    config.chassis.wheels = [];
    expect(issuePaths(config)).toContain('chassis.wheels');
  });

  it('names chassis.wheels when the wheel table is missing', () => {
    const config = rawConfig();
    delete config.chassis.wheels;
    expect(issuePaths(config)).toContain('chassis.wheels');
  });

  it('names the radius of a wheel with radius 0', () => {
    const config = rawConfig();
    config.chassis.wheels[2].radiusMm = 0;
    expect(issuePaths(config)).toEqual(['chassis.wheels.2.radiusMm']);
  });

  it('names the second of two motors with the same name', () => {
    const config = rawConfig();
    config.motors[1].name = config.motors[0].name;
    expect(issuePaths(config)).toContain('motors.1.name');
  });

  it('names a field holding NaN', () => {
    const config = rawConfig();
    config.chassis.wheels[0].xMm = Number.NaN;
    expect(issuePaths(config)).toEqual(['chassis.wheels.0.xMm']);
  });

  it('names a calibration whose centre is not between its ends', () => {
    const config = rawConfig();
    config.controls.channels[0].centre = 2500;
    expect(issuePaths(config)).toEqual(['controls.channels.0.centre']);
  });
});
