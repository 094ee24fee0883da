import { timerOfPin } from '../boards/boards';
import type { BoardPin } from '../boards/board-types';
import { busReason, boardWords, listWords, type PlanContext } from './plan-context';

/** How many PWM outputs a board side offers against how many the layout needs. */
export interface PwmBudget {
  unitWord: string;
  /** PWM units on the board before anything is taken. */
  total: number;
  available: number;
  needed: number;
  /** Units lost, and why: "the servo-pulse timer takes D9 and D10". */
  losses: string[];
}

function usablePwmPins(ctx: PlanContext): BoardPin[] {
  return ctx.board.pins.filter((p) => p.pwm && p.onHeader && p.digital && !p.flash && !p.inputOnly);
}

/**
 * Counts PWM capacity. AVR: PWM pins, minus those whose timer the servo pulses take and those
 * on a bus in use. ESP32: LEDC channels (servo pulses use them too). RP2040: slice channels,
 * since GPIO n and n + 16 share one (REFERENCES §4); servo pulses use them too.
 */
export function pwmBudget(ctx: PlanContext): PwmBudget {
  const pwmDemands = ctx.demands.filter((d) => d.need === 'pwm' && d.required).length;
  const servoDemands = ctx.demands.filter((d) => d.need === 'servo-pulse').length;
  const pins = usablePwmPins(ctx);
  const busLost = pins.filter((p) => busReason(ctx, p));
  const free = pins.filter((p) => !busReason(ctx, p));
  const losses: string[] = [];
  if (busLost.length > 0)
    losses.push(`the ${busLost[0].spi ? 'SPI bus' : 'USB serial port'} takes ${listWords(busLost.map((p) => p.id))}`);
  const units = ctx.board.pwmUnits;
  if (units.kind === 'avr-timers') {
    const servoLost = free.filter((p) => ctx.servoTimerIds.includes(timerOfPin(ctx.board, p)?.id ?? -1));
    if (servoLost.length > 0) losses.push(`the servo-pulse timer takes ${listWords(servoLost.map((p) => p.id))}`);
    return {
      unitWord: 'PWM pins',
      total: pins.length,
      available: free.length - servoLost.length,
      needed: pwmDemands,
      losses,
    };
  }
  if (units.kind === 'ledc') {
    // Pins lost to a bus matter only when fewer pins than channels are left.
    const available = Math.min(units.channels, free.length);
    return {
      unitWord: 'PWM channels',
      total: units.channels,
      available,
      needed: pwmDemands + servoDemands,
      losses: available < units.channels ? losses : [],
    };
  }
  const channels = (list: BoardPin[]) => new Set(list.map((p) => JSON.stringify(p.pwm))).size;
  return {
    unitWord: 'PWM slice channels',
    total: channels(pins),
    available: channels(free),
    needed: pwmDemands + servoDemands,
    losses,
  };
}

/** "the Uno has 6 PWM pins, this layout needs 8" (with what was lost, when anything was). */
export function pwmBudgetSentence(ctx: PlanContext, budget: PwmBudget): string {
  const head = `${boardWords(ctx)} has ${budget.total} ${budget.unitWord}`;
  if (budget.losses.length === 0 || budget.available === budget.total)
    return `${head}, this layout needs ${budget.needed}`;
  return `${head}, ${budget.available} once ${budget.losses.join(' and ')}; this layout needs ${budget.needed}`;
}
