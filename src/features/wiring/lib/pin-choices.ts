import { findPin, timerOfPin } from '@shared/boards/boards';
import type { BoardPin } from '@shared/boards/board-types';
import { formatHz, pwmSettingForPin } from '@shared/boards/pwm-timing';
import { PlanState } from '@shared/pins/assign-search';
import { isOutputNeed, pinInability } from '@shared/pins/pin-abilities';
import { collectDemands, type PinDemand } from '@shared/pins/pin-demands';
import { pinFits, rankedPinCosts } from '@shared/pins/pin-fit';
import { busReason, planContexts, type PlanContext } from '@shared/pins/plan-context';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { pwmWords } from './pin-words';

// What the pin picker offers for one role: the pins that suit it as things stand (cheapest first,
// the same order the automatic assignment tries), then every other pin with the reason it would
// draw a problem. Uses the pin plan's own fit, cost and PWM-unit bookkeeping, so the picker and
// the check never disagree about what suits.

export interface PinChoice {
  pin: BoardPin;
  /** Suits: what the pin brings to the role ("timer 1 A"). Other: why it would draw a problem. */
  note: string;
  /** Other roles already on this pin (same board side). */
  usedBy: string[];
}

export interface PinChoices {
  suits: PinChoice[];
  others: PinChoice[];
  /** The pin stored for the role when the board has no such pin (kept so the picker can show it). */
  unknownPin: string | null;
}

function stateWithout(ctx: PlanContext, demand: PinDemand): PlanState {
  const state = new PlanState(ctx);
  for (const other of ctx.demands) {
    if (other.key === demand.key || other.pin === null) continue;
    const pin = findPin(ctx.board, other.pin);
    if (pin) state.apply(other, pin, 1);
  }
  return state;
}

function suitNote(ctx: PlanContext, demand: PinDemand, pin: BoardPin): string {
  switch (demand.need) {
    case 'pwm':
    case 'servo-pulse':
      return pwmWords(ctx.board, pin) ?? 'PWM';
    case 'external-interrupt':
      return ctx.board.family === 'avr' ? `external interrupt ${pin.externalInterrupt}` : 'interrupt';
    case 'interrupt':
      return pin.externalInterrupt !== undefined && ctx.board.family === 'avr'
        ? `external interrupt ${pin.externalInterrupt}`
        : pin.pinChange
          ? 'pin-change interrupt'
          : 'interrupt';
    case 'uart-rx': {
      const rx = pin.uart?.find((u) => u.role === 'rx');
      return rx ? `${rx.port} receive` : 'serial receive via the pin matrix';
    }
    case 'analog-in':
      return 'analog input';
    case 'switch-in':
      return 'input with pull-up';
    case 'led':
      return pin.builtinLed ? 'the built-in LED' : 'digital output';
    default:
      return pin.spi === 'ss' && ctx.spiInUse ? 'SPI SS, kept as an output' : 'digital output';
  }
}

/** Why this pin would draw a problem for the role; the first reason the pin check would give. */
function problemNote(ctx: PlanContext, demand: PinDemand, pin: BoardPin, state: PlanState, usedBy: string[]): string {
  const inability = pinInability(ctx.board, pin, demand.need);
  if (inability) return inability.reason;
  const bus = busReason(ctx, pin);
  if (bus) return bus.reason;
  if (ctx.spiInUse && ctx.board.spi.ssMustBeOutput && pin.id === ctx.board.spi.ss && !isOutputNeed(demand.need))
    return 'is the SPI SS pin, which must stay an output';
  const use = state.pins.get(pin.id);
  if (use && (demand.shareGroup === null || use.group !== demand.shareGroup))
    return `already used for ${usedBy.join(', ')}`;
  const timer = timerOfPin(ctx.board, pin);
  if (demand.need === 'pwm' && timer && ctx.servoTimerIds.includes(timer.id))
    return `is on timer ${timer.id}, which the servo pulses take`;
  if (demand.need === 'pwm' && demand.requestedHz !== null) {
    const setting = pwmSettingForPin(ctx.board, pin, demand.requestedHz, demand.ceilingHz);
    if (setting && !setting.exact) {
      return timer?.id === 0
        ? `is on timer 0 (millis()), which stays at ${formatHz(setting.actualHz)}`
        : `its timer can only make ${formatHz(setting.actualHz)}, not ${formatHz(demand.requestedHz)}`;
    }
  }
  if (!state.allows(demand, pin, false)) return unitClash(ctx, pin);
  if (!state.allows(demand, pin, true))
    return timer
      ? `timer ${timer.id} also runs another role at its own frequency`
      : 'shares its PWM unit with another role';
  if (pin.strapping) return 'is a boot strapping pin: the wrong level at reset stops the board starting';
  if (pin.usbSerial) return 'carries the USB serial port: uploads may fail while it is wired';
  return 'draws a warning';
}

function unitClash(ctx: PlanContext, pin: BoardPin): string {
  const pwm = pin.pwm;
  if (pwm && 'timer' in pwm) return `timer ${pwm.timer} already runs another driver at a different frequency`;
  if (pwm && 'slice' in pwm) return `PWM slice ${pwm.slice} channel ${pwm.channel} is taken or runs another frequency`;
  return `all ${ctx.board.pwmUnits.kind === 'ledc' ? ctx.board.pwmUnits.channels : ''} PWM channels are in use`;
}

/** Labels of the other roles on each pin of one board side. */
function usersByPin(ctx: PlanContext, demand: PinDemand): Map<string, string[]> {
  const map = new Map<string, string[]>();
  for (const other of ctx.demands) {
    if (other.key === demand.key || other.pin === null) continue;
    map.set(other.pin, [...(map.get(other.pin) ?? []), other.label]);
  }
  return map;
}

export function choicesFor(ctx: PlanContext, demand: PinDemand): PinChoices {
  const state = stateWithout(ctx, demand);
  const users = usersByPin(ctx, demand);
  const costs = new Map(rankedPinCosts(ctx, demand, false).map((r) => [r.pin.id, r.cost]));
  const order = new Map(ctx.board.pins.map((p, i) => [p.id, i]));
  const suits: PinChoice[] = [];
  const others: PinChoice[] = [];
  for (const pin of ctx.board.pins) {
    const usedBy = users.get(pin.id) ?? [];
    if (pinFits(ctx, demand, pin, true) && state.allows(demand, pin, true)) {
      const shared = usedBy.length > 0 ? ` (shared with ${usedBy.join(', ')})` : '';
      suits.push({ pin, note: suitNote(ctx, demand, pin) + shared, usedBy });
    } else {
      others.push({ pin, note: problemNote(ctx, demand, pin, state, usedBy), usedBy });
    }
  }
  const rank = (p: PinChoice) => costs.get(p.pin.id) ?? 0;
  suits.sort((a, b) => rank(a) - rank(b) || order.get(a.pin.id)! - order.get(b.pin.id)!);
  const unknownPin = demand.pin !== null && !findPin(ctx.board, demand.pin) ? demand.pin : null;
  return { suits, others, unknownPin };
}

/** The picker's choices for every role of the configuration, by demand key. */
export function allPinChoices(
  config: RobotConfig,
  demands: PinDemand[] = collectDemands(config),
): Map<string, PinChoices> {
  const map = new Map<string, PinChoices>();
  for (const ctx of planContexts(config, demands)) {
    for (const demand of ctx.demands) map.set(demand.key, choicesFor(ctx, demand));
  }
  return map;
}
