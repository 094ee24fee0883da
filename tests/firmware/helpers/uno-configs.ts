import type { DriveLayoutId, DriverKindId, InputSourceId } from '@shared/schemas/ids';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { driverPinRoles } from '@shared/drivers/driver-kinds';
import { buildStarterConfig } from '@shared/starter';

/**
 * Fixed Uno wiring used by the simulator tests (test data, not the pin planner): PWM roles take
 * the timer outputs in order, other roles plain digital pins, a shared standby pin, the status
 * LED on D13 and a serial receiver on D0.
 */
export function unoWiredConfig(
  layout: DriveLayoutId,
  input: InputSourceId,
  driver: DriverKindId,
  tweak: (c: RobotConfig) => void = () => {},
): RobotConfig {
  const config = structuredClone(buildStarterConfig({ layout, board: 'uno', input, driver }));
  const pwm = ['D9', 'D10', 'D5', 'D6', 'D3', 'D11'];
  const digital = ['D2', 'D4', 'D7', 'D8', 'D12', 'A0', 'A1', 'A2', 'A4', 'A5'];
  const take = (pin: string) => digital.splice(digital.indexOf(pin), 1)[0];
  if (input === 'ppm') config.wiring.inputPins = { ppm: { pin: take('D2'), locked: false } };
  if (input === 'rc-pwm') {
    const pulsePins = ['A0', 'A1', 'A2', 'A4', 'A5'];
    config.wiring.inputPins = Object.fromEntries(
      config.controls.channels.map((c, i) => [`ch${c.number}`, { pin: take(pulsePins[i]), locked: false }]),
    );
  }
  for (const d of config.wiring.drivers) {
    for (const role of driverPinRoles(d.kind, d.motors.length)) {
      if (role.optional) continue;
      const pin = role.shareable ? 'A3' : role.need === 'pwm' ? pwm.shift() : digital.shift();
      if (!pin) throw new Error(`The Uno test wiring has no pin left for ${d.name} ${role.id}`);
      d.pins[role.id] = { pin, locked: false };
    }
  }
  if (input === 'sbus' || input === 'ibus') {
    // The Uno's only serial port takes the receiver; the pin plan then wants diagnostics off.
    config.wiring.inputPins = { rx: { pin: 'D0', locked: false } };
    config.firmware.serialDiagnostics = false;
  }
  config.wiring.statusLed = { pin: 'D13', locked: false };
  tweak(config);
  return RobotConfigSchema.parse(config);
}
