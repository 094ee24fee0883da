import type { RobotConfig } from '@shared/schemas/robot-config';
import { CHANNEL_PREFIXES } from '@shared/drivers/driver-kinds';
import { findPin, getBoard } from '@shared/boards/boards';
import { unoPinDuty } from './avr-registers';

/**
 * The signed duty (−255..255) a motor's driver pins show in an Uno register dump, read the
 * way each driver kind's truth table says (REFERENCES §7): + is forward.
 */
export function signedUnoDuty(config: RobotConfig, motorIndex: number, regs: Record<number, number>): number {
  const name = config.motors[motorIndex].name;
  const driver = config.wiring.drivers.find((d) => d.motors.includes(name))!;
  const prefix = CHANNEL_PREFIXES[driver.motors.indexOf(name)];
  const board = getBoard(config.wiring.board);
  const duty = (key: string) => {
    const id = driver.pins[`${prefix}.${key}`]?.pin;
    return id ? unoPinDuty(findPin(board, id)!.code, regs) : 0;
  };
  const high = (key: string) => duty(key) === 255;
  switch (driver.kind) {
    case 'pwm-in1-in2-stby':
    case 'en-in1-in2': {
      const magnitude = duty(driver.kind === 'en-in1-in2' ? 'en' : 'pwm');
      if (high('in1') && !high('in2')) return magnitude;
      if (!high('in1') && high('in2')) return -magnitude;
      return 0;
    }
    case 'pwm-dir':
      return high('dir') ? duty('pwm') : -duty('pwm');
    case 'dual-pwm':
      return duty('fwd') > 0 && duty('rev') === 0
        ? duty('fwd')
        : duty('rev') > 0 && duty('fwd') === 0
          ? -duty('rev')
          : 0;
    case 'two-input':
      return duty('in1') > 0 && duty('in2') === 0
        ? duty('in1')
        : duty('in2') > 0 && duty('in1') === 0
          ? -duty('in2')
          : 0;
    default:
      throw new Error(`No register reading for ${driver.kind}`);
  }
}
