import { NEED_WORDS, type PinDemand, type PinNeed } from './pin-demands';
import { pinFits } from './pin-fit';
import { boardWords, type PlanContext } from './plan-context';
import { pwmBudget, pwmBudgetSentence } from './pwm-budget';

// Counting arguments that show at once that no plan exists, phrased for the builder:
// "the Uno has 6 PWM pins, this layout needs 8".

const NEED_ORDER: PinNeed[] = [
  'pwm',
  'external-interrupt',
  'uart-rx',
  'interrupt',
  'analog-in',
  'switch-in',
  'servo-pulse',
  'digital-out',
  'led',
];

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

function serialReason(ctx: PlanContext): string | null {
  const rxPins = ctx.board.pins.filter((p) => p.uart?.some((u) => u.role === 'rx'));
  if (rxPins.length === 1 && rxPins[0].usbSerial && ctx.usbSerialInUse) {
    return `${boardWords(ctx)}’s only serial receive pin, ${rxPins[0].id}, carries the USB serial port that serial diagnostics use; turn diagnostics off to receive the serial receiver there`;
  }
  return null;
}

/** A sentence when the free pins cannot possibly cover the roles still open, else null. */
export function shortageReason(ctx: PlanContext, locked: PinDemand[], open: PinDemand[]): string | null {
  const budget = pwmBudget(ctx);
  if (budget.needed > budget.available) return pwmBudgetSentence(ctx, budget);
  const taken = new Set(locked.map((d) => d.pin));
  const free = ctx.board.pins.filter((p) => !taken.has(p.id));
  const lone = open.filter((d) => d.shareGroup === null);
  const shared = new Set(open.filter((d) => d.shareGroup !== null).map((d) => d.shareGroup));
  for (const need of NEED_ORDER) {
    const wanting = lone.filter((d) => d.need === need);
    if (wanting.length === 0) continue;
    const fitting = free.filter((p) => wanting.some((d) => pinFits(ctx, d, p, false)));
    if (fitting.length >= wanting.length) continue;
    if (need === 'uart-rx') return serialReason(ctx) ?? `${boardWords(ctx)} has no free serial receive pin`;
    const listed = fitting.length > 0 && fitting.length <= 4 ? ` (${fitting.map((p) => p.id).join(', ')})` : '';
    return `${boardWords(ctx)} has ${plural(fitting.length, 'free pin')} with ${NEED_WORDS[need]}${listed}, this layout needs ${wanting.length}`;
  }
  const usable = free.filter((p) => open.some((d) => pinFits(ctx, d, p, false)));
  const needed = lone.length + shared.size;
  if (usable.length < needed)
    return `${boardWords(ctx)} has ${plural(usable.length, 'usable pin')} for these roles, this layout needs ${needed}`;
  return null;
}
