import { defaultPwmHz, timerOfPin } from '../boards/boards';
import type { BoardPin } from '../boards/board-types';
import type { PinDemand } from './pin-demands';
import { rankedPinCosts, type RankedPin } from './pin-fit';
import type { PlanContext } from './plan-context';

// Backtracking search for a pin per role: most constrained role first (fewest pins left),
// cheapest pin first, with forward checking (a role left without pins fails at once) and a
// pigeonhole test on PWM units and on pins overall. Deterministic: every choice is ordered.

interface TimerUse {
  count: number;
  /** Users by frequency key ('default' or the Hz asked for). */
  keys: Map<string, number>;
  drivers: Map<number, number>;
}

export interface SearchOptions {
  /** Also avoid what would only draw a warning. */
  strict: boolean;
  nodeLimit: number;
}

export interface SearchOutcome {
  placed: Map<string, string> | null;
  /** The role that most often ran out of pins, for the reason sentence. */
  culprit: PinDemand | null;
  nodes: number;
  exhausted: boolean;
}

const bump = <K>(map: Map<K, number>, key: K, by: number) => {
  const next = (map.get(key) ?? 0) + by;
  if (next === 0) map.delete(key);
  else map.set(key, next);
};

/** Usage of pins and PWM hardware by the roles placed so far; place/remove undo each other. */
export class PlanState {
  readonly pins = new Map<string, { group: string | null; count: number }>();
  readonly timers = new Map<number, TimerUse>();
  readonly sliceChannels = new Map<string, Map<string, number>>();
  readonly sliceHz = new Map<number, Map<number, number>>();
  readonly ledcPins = new Map<string, number>();

  constructor(private readonly ctx: PlanContext) {}

  private usesPwmUnit(d: PinDemand): boolean {
    return d.need === 'pwm' || (d.need === 'servo-pulse' && this.ctx.board.family !== 'avr');
  }

  private hzOf(d: PinDemand, pin: BoardPin): number {
    return d.requestedHz ?? defaultPwmHz(this.ctx.board, pin) ?? 1000;
  }

  allows(d: PinDemand, pin: BoardPin, strict: boolean): boolean {
    const use = this.pins.get(pin.id);
    if (use && (d.shareGroup === null || use.group !== d.shareGroup)) return false;
    if (!this.usesPwmUnit(d) || !pin.pwm) return true;
    const pwm = pin.pwm;
    if ('timer' in pwm) {
      const t = this.timers.get(pwm.timer);
      if (!t) return true;
      const key = d.requestedHz === null ? 'default' : String(d.requestedHz);
      if (strict) return t.keys.size === 1 && t.keys.has(key);
      const asked = [...t.keys.keys()].filter((k) => k !== 'default');
      return key === 'default' || asked.every((k) => k === key);
    }
    if ('slice' in pwm) {
      const owners = this.sliceChannels.get(`${pwm.slice}${pwm.channel}`);
      if (owners && !owners.has(pin.id)) return false;
      const hz = this.sliceHz.get(pwm.slice);
      return !hz || (hz.size === 1 && hz.has(this.hzOf(d, pin)));
    }
    const units = this.ctx.board.pwmUnits;
    return this.ledcPins.has(pin.id) || units.kind !== 'ledc' || this.ledcPins.size < units.channels;
  }

  /** by = 1 places, by = −1 removes. */
  apply(d: PinDemand, pin: BoardPin, by: 1 | -1): void {
    const use = this.pins.get(pin.id) ?? { group: d.shareGroup, count: 0 };
    use.count += by;
    if (use.count === 0) this.pins.delete(pin.id);
    else this.pins.set(pin.id, use);
    if (!this.usesPwmUnit(d) || !pin.pwm) return;
    const pwm = pin.pwm;
    if ('timer' in pwm) {
      const t = this.timers.get(pwm.timer) ?? { count: 0, keys: new Map(), drivers: new Map() };
      t.count += by;
      bump(t.keys, d.requestedHz === null ? 'default' : String(d.requestedHz), by);
      if (d.driverIndex !== null) bump(t.drivers, d.driverIndex, by);
      if (t.count === 0) this.timers.delete(pwm.timer);
      else this.timers.set(pwm.timer, t);
    } else if ('slice' in pwm) {
      const key = `${pwm.slice}${pwm.channel}`;
      const owners = this.sliceChannels.get(key) ?? new Map<string, number>();
      bump(owners, pin.id, by);
      if (owners.size === 0) this.sliceChannels.delete(key);
      else this.sliceChannels.set(key, owners);
      const hz = this.sliceHz.get(pwm.slice) ?? new Map<number, number>();
      bump(hz, this.hzOf(d, pin), by);
      if (hz.size === 0) this.sliceHz.delete(pwm.slice);
      else this.sliceHz.set(pwm.slice, hz);
    } else {
      bump(this.ledcPins, pin.id, by);
    }
  }

  /** Lower is better: share a chip's standby pin, keep a driver's PWM on one timer or slice. */
  bonus(d: PinDemand, pin: BoardPin): number {
    if (d.shareGroup !== null && this.pins.get(pin.id)?.group === d.shareGroup) return -100;
    const timer = timerOfPin(this.ctx.board, pin);
    if (d.need === 'pwm' && timer && d.driverIndex !== null) {
      const t = this.timers.get(timer.id);
      if (t?.drivers.has(d.driverIndex)) return -8;
      if (t) return -3;
    }
    if (this.usesPwmUnit(d) && pin.pwm && 'slice' in pin.pwm) {
      const partner = `${pin.pwm.slice}${pin.pwm.channel === 'A' ? 'B' : 'A'}`;
      if (this.sliceChannels.has(partner)) return -3;
    }
    return 0;
  }

  /** Where a PWM role lands: the slice channel on the RP2040, else the pin itself. */
  unitOf(d: PinDemand, pin: BoardPin): string {
    if (this.usesPwmUnit(d) && pin.pwm && 'slice' in pin.pwm) return `slice:${pin.pwm.slice}${pin.pwm.channel}`;
    return pin.id;
  }
}

interface Variable {
  demand: PinDemand;
  domain: BoardPin[];
  ranked: Map<BoardPin, RankedPin>;
}

/**
 * One pass over the open roles: the one with fewest pins left (most constrained), and a
 * pigeonhole test: roles outside share groups need that many distinct pins, and the PWM ones
 * that many distinct PWM units.
 */
function survey(
  state: PlanState,
  open: Variable[],
  strict: boolean,
): { pick: Variable; count: number; pigeonholeOk: boolean } {
  let pick = open[0];
  let pickCount = Infinity;
  const pins = new Set<string>();
  const units = new Set<string>();
  let lone = 0;
  let pwmLone = 0;
  for (const v of open) {
    const isLone = v.demand.shareGroup === null;
    const isPwm = v.demand.need === 'pwm' || v.demand.need === 'servo-pulse';
    if (isLone) lone += 1;
    if (isLone && isPwm) pwmLone += 1;
    let count = 0;
    for (const pin of v.domain) {
      if (!state.allows(v.demand, pin, strict)) continue;
      count += 1;
      if (!isLone) continue;
      pins.add(pin.id);
      if (isPwm) units.add(state.unitOf(v.demand, pin));
    }
    if (count < pickCount) {
      pick = v;
      pickCount = count;
    }
    if (count === 0) return { pick, count: 0, pigeonholeOk: false };
  }
  return { pick, count: pickCount, pigeonholeOk: pins.size >= lone && units.size >= pwmLone };
}

export function searchPlacement(
  ctx: PlanContext,
  state: PlanState,
  demands: PinDemand[],
  options: SearchOptions,
): SearchOutcome {
  const variables: Variable[] = demands.map((demand) => {
    const ranked = rankedPinCosts(ctx, demand, options.strict);
    return { demand, domain: ranked.map((r) => r.pin), ranked: new Map(ranked.map((r) => [r.pin, r])) };
  });
  const placed = new Map<string, string>();
  const starved = new Map<Variable, number>();
  let nodes = 0;
  let exhausted = false;

  const step = (open: Variable[]): boolean => {
    if (open.length === 0) return true;
    if (nodes >= options.nodeLimit) {
      exhausted = true;
      return false;
    }
    const { pick, count, pigeonholeOk } = survey(state, open, options.strict);
    if (count === 0) {
      starved.set(pick, (starved.get(pick) ?? 0) + 1);
      return false;
    }
    if (!pigeonholeOk) return false;
    const rest = open.filter((v) => v !== pick);
    const score = (p: BoardPin) => pick.ranked.get(p)!.cost + state.bonus(pick.demand, p);
    const values = pick.domain
      .filter((p) => state.allows(pick.demand, p, options.strict))
      .sort((a, b) => score(a) - score(b) || pick.ranked.get(a)!.order - pick.ranked.get(b)!.order);
    for (const pin of values) {
      nodes += 1;
      state.apply(pick.demand, pin, 1);
      placed.set(pick.demand.key, pin.id);
      if (step(rest)) return true;
      placed.delete(pick.demand.key);
      state.apply(pick.demand, pin, -1);
      if (exhausted) return false;
    }
    return false;
  };

  const ok = step(variables);
  let culprit: Variable | null = null;
  for (const [v, n] of starved) if (!culprit || n > starved.get(culprit)!) culprit = v;
  return { placed: ok ? placed : null, culprit: culprit?.demand ?? null, nodes, exhausted };
}
