import type { DriveLayoutId } from '@shared/schemas/ids';
import { RobotConfigSchema, type RobotConfig, type RobotConfigInput, type Wheel } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';

/** A wheel with ordinary values; override what the test is about. */
export function makeWheel(overrides: Partial<Wheel> = {}): Wheel {
  return {
    name: 'Wheel',
    kind: 'omni',
    xMm: 0,
    yMm: 100,
    driveAngleDeg: 0,
    rollerAngleDeg: 0,
    radiusMm: 30,
    motor: 'M1',
    reversed: false,
    maxRpm: 200,
    ...overrides,
  };
}

/** A complete starter configuration for a layout. */
export function makeConfig(
  layout: DriveLayoutId = 'quad-mecanum',
  change?: (config: RobotConfig) => void,
): RobotConfig {
  const config = buildStarterConfig({ layout });
  change?.(config);
  return config;
}

/** A configuration with a custom wheel table: one motor per wheel, named after the wheel. */
export function makeCustomConfig(wheels: Wheel[]): RobotConfig {
  const base = makeConfig('trio-omni');
  const motors = [...new Set(wheels.map((w) => w.motor))].map((name) => ({ name }));
  const input: RobotConfigInput = {
    ...base,
    chassis: { layout: 'custom', params: {}, wheels },
    motors,
    wiring: { ...base.wiring, drivers: [] },
  };
  return RobotConfigSchema.parse(input);
}

/** A plain JSON copy to break, for validation tests. */
export function rawConfig(layout: DriveLayoutId = 'quad-mecanum'): Record<string, any> {
  return JSON.parse(JSON.stringify(makeConfig(layout)));
}
