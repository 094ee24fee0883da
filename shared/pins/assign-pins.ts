import { findPin } from '../boards/boards';
import type { Problem } from '../problems/problem';
import type { RobotConfig } from '../schemas/robot-config';
import { checkDrivers } from './check-drivers';
import { checkPinPlan } from './check-pins';
import { checkPinRoles } from './check-pin-roles';
import { checkPwmHardware } from './check-pwm-hardware';
import { PlanState, searchPlacement } from './assign-search';
import { shortageReason } from './assign-reasons';
import { collectDemands, NEED_WORDS, strayDriverRoles, strayInputRoles, type PinDemand } from './pin-demands';
import { rankedPins } from './pin-fit';
import { boardWords, type PlanContext, planContexts } from './plan-context';

export type AssignResult = { ok: true; config: RobotConfig } | { ok: false; reason: string };

/** Placements tried before giving up; ordinary layouts need a few dozen. */
const NODE_LIMIT = 200_000;

const CONFIG_LEVEL_CODES = new Set([
  'motor-not-on-driver',
  'motor-on-two-drivers',
  'driver-motor-unknown',
  'driver-too-many-motors',
  'pwm-frequency-above-driver-max',
]);

function sentence(problem: Problem, tail: string): string {
  return `${problem.message.replace(/\.$/, '')}; ${tail}.`;
}

/** Errors among the locked pins alone: nothing the assignment may change can fix them. */
function lockedError(ctx: PlanContext, locked: PinDemand[]): string | null {
  const only = { ...ctx, demands: locked };
  const problem = [...checkPinRoles(only), ...checkPwmHardware(only)].find(
    (p) => p.severity === 'error' && p.code !== 'too-few-pwm-pins',
  );
  return problem ? sentence(problem, 'unlock or move that pin') : null;
}

/** Places the required roles of one board, then the optional ones where a pin is left. */
function assignSide(ctx: PlanContext): { placed: Map<string, string> } | { reason: string } {
  const locked = ctx.demands.filter((d) => d.locked && d.pin !== null);
  const lockedProblem = lockedError(ctx, locked);
  if (lockedProblem) return { reason: lockedProblem };
  const open = ctx.demands.filter((d) => !(d.locked && d.pin !== null));
  const shortage = shortageReason(
    ctx,
    locked,
    open.filter((d) => d.required),
  );
  if (shortage) return { reason: shortage };
  for (const strict of [true, false]) {
    const state = new PlanState(ctx);
    for (const d of locked) state.apply(d, findPin(ctx.board, d.pin!)!, 1);
    const outcome = searchPlacement(
      ctx,
      state,
      open.filter((d) => d.required),
      { strict, nodeLimit: NODE_LIMIT },
    );
    if (!outcome.placed) {
      if (!strict) return { reason: failureReason(ctx, outcome.culprit, outcome.exhausted) };
      continue;
    }
    placeOptional(
      ctx,
      state,
      open.filter((d) => !d.required),
      outcome.placed,
    );
    return { placed: outcome.placed };
  }
  return { reason: failureReason(ctx, null, false) };
}

/** Status LED, then enables, then the bench-test switch: each gets the best pin still free. */
function placeOptional(ctx: PlanContext, state: PlanState, optional: PinDemand[], placed: Map<string, string>): void {
  const order = (d: PinDemand) => (d.owner === 'status-led' ? 0 : d.owner === 'driver' ? 1 : 2);
  for (const demand of [...optional].sort((a, b) => order(a) - order(b))) {
    // A status LED on a strapping pin (a warning) beats no status LED (also a warning); a
    // bench-test switch held low at reset would change the boot mode, so it never goes there.
    const pin =
      rankedPins(ctx, demand, true).find((p) => state.allows(demand, p, true)) ??
      (demand.owner === 'status-led'
        ? rankedPins(ctx, demand, false).find((p) => state.allows(demand, p, false) && !p.usbSerial)
        : undefined);
    if (!pin) continue;
    state.apply(demand, pin, 1);
    placed.set(demand.key, pin.id);
  }
}

function failureReason(ctx: PlanContext, culprit: PinDemand | null, exhausted: boolean): string {
  if (exhausted)
    return `no pin plan was found for ${boardWords(ctx)} within ${NODE_LIMIT.toLocaleString('en')} tries; lock a few pins to narrow the search`;
  if (!culprit) return `no pin plan fits ${boardWords(ctx)} with the pins locked as they are`;
  return `no pin is left on ${boardWords(ctx)} for ${culprit.label}, which needs ${NEED_WORDS[culprit.need]}, once the other roles and their timers are placed`;
}

/** A copy with new pin assignments; only the records that hold pins are copied. */
function writePins(config: RobotConfig, demands: PinDemand[], placed: Map<string, string>): RobotConfig {
  const next: RobotConfig = {
    ...config,
    wiring: {
      ...config.wiring,
      drivers: config.wiring.drivers.map((d) => ({ ...d, pins: { ...d.pins } })),
      inputPins: { ...config.wiring.inputPins },
    },
    controls: {
      ...config.controls,
      link: { ...config.controls.link, remotePins: { ...config.controls.link.remotePins } },
    },
  };
  // Unlocked pins kept under roles that no longer exist (another kind or source before) go.
  for (const { driverIndex, roleId } of strayDriverRoles(config)) {
    if (!next.wiring.drivers[driverIndex].pins[roleId].locked) delete next.wiring.drivers[driverIndex].pins[roleId];
  }
  for (const { roleId, remote } of strayInputRoles(config)) {
    const record = remote ? next.controls.link.remotePins : next.wiring.inputPins;
    if (!record[roleId].locked) delete record[roleId];
  }
  for (const d of demands) {
    if (d.locked && d.pin !== null) continue;
    const value = { pin: placed.get(d.key) ?? null, locked: false };
    if (d.owner === 'driver') next.wiring.drivers[d.driverIndex!].pins[d.roleId] = value;
    else if (d.owner === 'input') next.wiring.inputPins[d.roleId] = value;
    else if (d.owner === 'status-led') next.wiring.statusLed = value;
    else if (d.owner === 'bench-test') next.wiring.benchTestPin = value;
    else next.controls.link.remotePins[d.roleId] = value;
  }
  return next;
}

/**
 * Fills every unlocked pin so the pin check finds no error, keeping locked pins. Deterministic:
 * the same configuration gives the same plan. When no plan exists, says why in one sentence.
 */
export function assignPins(config: RobotConfig): AssignResult {
  const configError = checkDrivers(config).find((p) => p.severity === 'error' && CONFIG_LEVEL_CODES.has(p.code));
  if (configError) return { ok: false, reason: sentence(configError, 'fix that before pins can be assigned') };
  const demands = collectDemands(config);
  const placed = new Map<string, string>();
  for (const ctx of planContexts(config, demands)) {
    const result = assignSide(ctx);
    if ('reason' in result) return { ok: false, reason: capitalizeSentence(result.reason) };
    for (const [key, pin] of result.placed) placed.set(key, pin);
  }
  const next = writePins(config, demands, placed);
  const leftover = checkPinPlan(next).find((p) => p.severity === 'error');
  if (leftover) return { ok: false, reason: leftover.message };
  return { ok: true, config: next };
}

function capitalizeSentence(text: string): string {
  const body = text.charAt(0).toUpperCase() + text.slice(1);
  return /[.!?]$/.test(body) ? body : `${body}.`;
}
