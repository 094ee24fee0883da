import type { BoardId } from '../schemas/ids';
import { MEGA2560, NANO, UNO } from './avr-boards';
import type { AvrTimer, BoardPin, BoardProfile } from './board-types';
import { ESP32_DEVKITC } from './esp32-devkitc';
import { RP2040_PICO } from './rp2040-pico';

export const BOARDS: Record<BoardId, BoardProfile> = {
  uno: UNO,
  nano: NANO,
  mega2560: MEGA2560,
  'esp32-devkitc': ESP32_DEVKITC,
  'rp2040-pico': RP2040_PICO,
};

export function getBoard(id: BoardId): BoardProfile {
  return BOARDS[id];
}

const pinIndexCache = new WeakMap<BoardProfile, Map<string, BoardPin>>();

/** The pin with this id on the board, or undefined. Ids are matched exactly ('D9', 'GPIO4', 'GP15'). */
export function findPin(board: BoardProfile, id: string): BoardPin | undefined {
  let index = pinIndexCache.get(board);
  if (!index) {
    index = new Map(board.pins.map((p) => [p.id, p]));
    pinIndexCache.set(board, index);
  }
  return index.get(id);
}

/** The AVR timer driving a pin's PWM, if any. */
export function timerOfPin(board: BoardProfile, pin: BoardPin): AvrTimer | undefined {
  const pwm = pin.pwm;
  if (!pwm || !('timer' in pwm)) return undefined;
  return board.timers.find((t) => t.id === pwm.timer);
}

/**
 * Timers the Servo library takes for this many servo pulses: 12 servos per timer, in the
 * library's order (REFERENCES §2). Empty on boards whose servo pulses use per-pin PWM units.
 */
export function servoTimers(board: BoardProfile, servoCount: number): number[] {
  if (servoCount <= 0) return [];
  return board.servoTimerOrder.slice(0, Math.ceil(servoCount / 12));
}

/** The board's default analogWrite() frequency on a pin, in Hz (null for a pin without PWM). */
export function defaultPwmHz(board: BoardProfile, pin: BoardPin): number | null {
  if (!pin.pwm) return null;
  const pwm = pin.pwm;
  if ('timer' in pwm) return board.defaultPwmHz[String(pwm.timer)] ?? null;
  return board.defaultPwmHz['*'] ?? null;
}
