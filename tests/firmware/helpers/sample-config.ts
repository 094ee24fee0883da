import { CURRENT_SCHEMA_VERSION, RobotConfigSchema, type RobotConfig, type RobotConfigInput } from '@shared/schemas/robot-config';

/** A small differential robot on an Uno with an iBUS receiver and a TB6612-class driver. */
export function sampleConfigInput(overrides: Partial<RobotConfigInput> = {}): RobotConfigInput {
  const pin = (id: string) => ({ pin: id });
  return {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Garden Hauler',
    chassis: {
      layout: 'differential',
      wheels: [
        { name: 'Left', kind: 'track', xMm: 0, yMm: 100, driveAngleDeg: 0, rollerAngleDeg: 0, radiusMm: 35, motor: 'Left', maxRpm: 150 },
        { name: 'Right', kind: 'track', xMm: 0, yMm: -100, driveAngleDeg: 0, rollerAngleDeg: 0, radiusMm: 35, motor: 'Right', maxRpm: 150 },
      ],
    },
    motors: [{ name: 'Left' }, { name: 'Right' }],
    controls: {
      source: 'ibus',
      channels: [
        { number: 1, name: 'Aileron', low: 1000, centre: 1500, high: 2000 },
        { number: 2, name: 'Elevator', low: 1000, centre: 1500, high: 2000 },
        { number: 5, name: 'Switch', low: 1000, centre: 1500, high: 2000 },
      ],
      axes: { forward: { channel: 2 }, yaw: { channel: 1 } },
      rateSwitch: { channel: 5 },
    },
    wiring: {
      board: 'uno',
      drivers: [
        {
          name: 'Main driver',
          kind: 'pwm-in1-in2-stby',
          motors: ['Left', 'Right'],
          pins: { 'a.pwm': pin('D9'), 'a.in1': pin('D7'), 'a.in2': pin('D8'), 'b.pwm': pin('D10'), 'b.in1': pin('D12'), 'b.in2': pin('D4'), stby: pin('D6') },
        },
      ],
      inputPins: { rx: pin('D0') },
      statusLed: pin('D13'),
    },
    firmware: { serialDiagnostics: false },
    ...overrides,
  };
}

export function sampleConfig(overrides: Partial<RobotConfigInput> = {}): RobotConfig {
  return RobotConfigSchema.parse(sampleConfigInput(overrides));
}
