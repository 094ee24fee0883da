import type { BoardPin, BoardProfile } from '../boards/board-types';
import { NEED_WORDS, type PinNeed } from './pin-demands';

export interface Inability {
  code: 'pin-flash' | 'pin-input-only' | 'pin-cannot-do-role';
  /** Completes "<pin> …": "has no PWM". */
  reason: string;
}

const OUTPUT_NEEDS = new Set<PinNeed>(['pwm', 'digital-out', 'servo-pulse', 'led']);

export function isOutputNeed(need: PinNeed): boolean {
  return OUTPUT_NEEDS.has(need);
}

/** Whether a pin can take a kind of serial receive line on this board. */
function canReceiveSerial(board: BoardProfile, pin: BoardPin): boolean {
  if (pin.uart?.some((u) => u.role === 'rx')) return true;
  // ESP32: a UART's pins can be routed to any GPIO through the GPIO matrix.
  return board.uarts.some((u) => u.remappable && !u.usb);
}

function needReason(board: BoardProfile, pin: BoardPin, need: PinNeed): string | null {
  switch (need) {
    case 'pwm':
      return pin.pwm ? null : 'has no PWM';
    case 'interrupt':
      return pin.externalInterrupt !== undefined || pin.pinChange
        ? null
        : 'has neither an external nor a pin-change interrupt';
    case 'external-interrupt':
      return pin.externalInterrupt !== undefined ? null : 'has no external interrupt';
    case 'uart-rx':
      return canReceiveSerial(board, pin) ? null : 'is not a serial receive pin';
    case 'analog-in':
      return pin.analogIn ? null : 'has no analog input';
    case 'switch-in':
      return pin.pullUp ? null : 'has no internal pull-up for a switch to ground';
    default:
      return null;
  }
}

/** Why a pin cannot do a need on this board, or null when it can (bus and timer clashes aside). */
export function pinInability(board: BoardProfile, pin: BoardPin, need: PinNeed): Inability | null {
  if (pin.flash) return { code: 'pin-flash', reason: 'is wired to the flash memory' };
  if (pin.inputOnly && isOutputNeed(need)) return { code: 'pin-input-only', reason: 'is an input only' };
  if (!pin.onHeader && !(need === 'led' && pin.builtinLed))
    return { code: 'pin-cannot-do-role', reason: 'is not on the board’s header' };
  if (!pin.digital && need !== 'analog-in') return { code: 'pin-cannot-do-role', reason: 'is an analog input only' };
  const reason = needReason(board, pin, need);
  return reason ? { code: 'pin-cannot-do-role', reason } : null;
}

export function needWords(need: PinNeed): string {
  return NEED_WORDS[need];
}
