import { timerOfPin } from '../boards/boards';
import type { BoardPin } from '../boards/board-types';
import { pwmSettingForPin } from '../boards/pwm-timing';
import { isOutputNeed, pinInability } from './pin-abilities';
import type { PinDemand } from './pin-demands';
import { busReason, type PlanContext } from './plan-context';

// Whether one pin suits one role on its own (before other roles are placed), and how much the
// pin's other abilities would be wasted on it. Shared by the check's hints and the assignment.

/**
 * How much trouble a strapping pin makes when used (ESP32 boot-mode notes, from memory): GPIO 5
 * and 15 only set SDIO timing and the boot log, GPIO 0 and 2 choose the boot mode, GPIO 12
 * chooses the flash voltage and can stop the module booting (REFERENCES §3).
 */
const STRAPPING_RISK: Record<string, number> = { '5': 30, '15': 30, '2': 50, '0': 55, '12': 80 };

/**
 * strict: also avoid what only draws a warning (strapping pins, USB serial pins, a PWM frequency
 * the timer can only approximate).
 */
export function pinFits(ctx: PlanContext, demand: PinDemand, pin: BoardPin, strict: boolean): boolean {
  if (pinInability(ctx.board, pin, demand.need)) return false;
  if (busReason(ctx, pin)) return false;
  if (ctx.spiInUse && ctx.board.spi.ssMustBeOutput && pin.id === ctx.board.spi.ss && !isOutputNeed(demand.need))
    return false;
  if (strict && (pin.strapping || pin.usbSerial)) return false;
  if (demand.need !== 'pwm') return true;
  const timer = timerOfPin(ctx.board, pin);
  if (timer && ctx.servoTimerIds.includes(timer.id)) return false;
  if (demand.requestedHz === null) return true;
  const setting = pwmSettingForPin(ctx.board, pin, demand.requestedHz, demand.ceilingHz);
  if (!setting) return false;
  if (timer?.id === 0) return setting.exact;
  return setting.exact || !strict;
}

/**
 * What placing this role on this pin would waste: lower is better. Leaves external interrupts,
 * serial ports, buses and PWM pins free for roles that need them (AVR, where these are scarce),
 * keeps strapping and USB serial pins for last and puts the status LED on the board's LED.
 */
export function pinCost(ctx: PlanContext, demand: PinDemand, pin: BoardPin): number {
  const need = demand.need;
  const avr = ctx.board.family === 'avr';
  let cost = 0;
  if (avr && pin.externalInterrupt !== undefined && need !== 'external-interrupt')
    cost += need === 'interrupt' ? 12 : 30;
  if (avr && pin.pinChange && need !== 'interrupt') cost += 2;
  if (avr && pin.pwm && need !== 'pwm') cost += 20;
  if (pin.uart?.some((u) => u.port !== 'Serial') && need !== 'uart-rx') cost += 15;
  if (need === 'uart-rx' && pin.uart?.some((u) => u.role === 'rx')) cost -= 5;
  // With the transceiver fitted, SS is best spent on its CSN line (SS must be an output anyway).
  if (pin.spi === 'ss' && ctx.spiInUse) cost += demand.roleId === 'csn' ? -40 : 25;
  else if (pin.spi) cost += 10;
  if (pin.i2c) cost += 8;
  if (pin.analogIn && need !== 'analog-in') cost += 3;
  if (pin.strapping) cost += STRAPPING_RISK[pin.code] ?? 50;
  if (pin.usbSerial) cost += 60;
  if (pin.builtinLed) cost += need === 'led' ? -30 : 15;
  if (pin.inputOnly && !isOutputNeed(need)) cost -= 4;
  if (need === 'pwm') {
    // Timer 0 can never leave its default frequency (millis()); 8-bit timers only approximate one.
    const timer = timerOfPin(ctx.board, pin);
    if (timer?.id === 0) cost += 6;
    if (timer && timer.bits === 8 && demand.requestedHz !== null) cost += 10;
  }
  return cost;
}

export interface RankedPin {
  pin: BoardPin;
  cost: number;
  /** Position in the board's pin list, the final tie-break. */
  order: number;
}

/** Pins that suit the role on their own, cheapest first (board order breaks ties). */
export function rankedPinCosts(ctx: PlanContext, demand: PinDemand, strict: boolean): RankedPin[] {
  return ctx.board.pins
    .map((pin, order) => ({ pin, order, cost: pinCost(ctx, demand, pin) }))
    .filter(({ pin }) => pinFits(ctx, demand, pin, strict))
    .sort((a, b) => a.cost - b.cost || a.order - b.order);
}

export function rankedPins(ctx: PlanContext, demand: PinDemand, strict: boolean): BoardPin[] {
  return rankedPinCosts(ctx, demand, strict).map(({ pin }) => pin);
}
