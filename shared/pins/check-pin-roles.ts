import { findPin } from '../boards/boards';
import type { Problem } from '../problems/problem';
import { pinInability, needWords } from './pin-abilities';
import type { PinDemand } from './pin-demands';
import { rankedPins } from './pin-fit';
import { boardWords, busReason, capitalize, listWords, type PlanContext } from './plan-context';

// Per-role checks: is there a pin, does the board have it, can it do the role, is it free of
// buses in use, is it used once. Sentences name the pin and the role as the builder sees them.

function roleProblem(
  severity: Problem['severity'],
  code: string,
  demand: PinDemand,
  message: string,
  hint: string,
): Problem {
  return {
    severity,
    code,
    pins: demand.pin ? [demand.pin] : [],
    roles: [demand.roleName],
    message,
    hint,
    path: demand.path,
  };
}

/** Up to six pins that could take this role as things stand, for the hint. */
function candidates(ctx: PlanContext, demand: PinDemand, used: Set<string>): string {
  const ids = rankedPins(ctx, demand, true)
    .filter((p) => !used.has(p.id))
    .map((p) => p.id);
  if (ids.length === 0) return `No free pin on ${boardWords(ctx)} can do it; free one up or choose another board.`;
  return `Pins that can: ${ids.slice(0, 6).join(', ')}${ids.length > 6 ? ` and ${ids.length - 6} more` : ''}.`;
}

function checkOne(ctx: PlanContext, demand: PinDemand, used: Set<string>): Problem[] {
  if (demand.pin === null) {
    if (demand.owner === 'status-led') {
      return [
        roleProblem(
          'warning',
          'status-led-missing',
          demand,
          'No pin is set for the status LED, so the robot cannot show link and arming state.',
          candidates(ctx, demand, used),
        ),
      ];
    }
    if (!demand.required) return [];
    return [
      roleProblem(
        'error',
        'pin-missing',
        demand,
        `${capitalize(demand.label)} has no pin.`,
        candidates(ctx, demand, used),
      ),
    ];
  }
  const pin = findPin(ctx.board, demand.pin);
  if (!pin) {
    return [
      roleProblem(
        'error',
        'pin-unknown',
        demand,
        `${demand.pin} (for ${demand.label}) is not a pin of ${boardWords(ctx)}.`,
        candidates(ctx, demand, used),
      ),
    ];
  }
  const problems: Problem[] = [];
  const inability = pinInability(ctx.board, pin, demand.need);
  if (inability) {
    problems.push(
      roleProblem(
        'error',
        inability.code,
        demand,
        `${pin.id} ${inability.reason}, but ${demand.label} needs ${needWords(demand.need)}.`,
        candidates(ctx, demand, used),
      ),
    );
  }
  const bus = busReason(ctx, pin);
  if (bus) {
    const hint =
      bus.code === 'pin-on-usb-serial'
        ? `Move it, or turn serial diagnostics off. ${candidates(ctx, demand, used)}`
        : candidates(ctx, demand, used);
    problems.push(
      roleProblem('error', bus.code, demand, `${pin.id} ${bus.reason}; it cannot also be ${demand.label}.`, hint),
    );
  } else if (pin.usbSerial && !ctx.usbSerialInUse) {
    problems.push(
      roleProblem(
        'warning',
        'pin-shares-usb-serial',
        demand,
        `${pin.id} carries the USB serial port: uploads may fail while ${demand.label} is wired to it.`,
        'Unplug that wire while uploading, or move the role.',
      ),
    );
  }
  if (ctx.spiInUse && ctx.board.spi.ssMustBeOutput && pin.id === ctx.board.spi.ss && !isOutput(demand)) {
    problems.push(
      roleProblem(
        'error',
        'spi-ss-not-output',
        demand,
        `${pin.id} is the SPI SS pin: as an input reading low it would switch the SPI bus to slave mode and stop the transceiver.`,
        'Use SS for an output (the transceiver’s CSN is a good fit) and move this input.',
      ),
    );
  }
  if (pin.strapping) {
    problems.push(
      roleProblem(
        'warning',
        'pin-strapping',
        demand,
        `${pin.id} is a boot strapping pin: if ${demand.label} holds it at the wrong level during reset, the board will not start.`,
        candidates(ctx, demand, used),
      ),
    );
  }
  return problems;
}

function isOutput(demand: PinDemand): boolean {
  return ['pwm', 'digital-out', 'servo-pulse', 'led'].includes(demand.need);
}

function checkShared(ctx: PlanContext): Problem[] {
  const byPin = new Map<string, PinDemand[]>();
  for (const d of ctx.demands) if (d.pin !== null) byPin.set(d.pin, [...(byPin.get(d.pin) ?? []), d]);
  const problems: Problem[] = [];
  for (const [pin, list] of byPin) {
    if (list.length < 2) continue;
    const group = list[0].shareGroup;
    if (group !== null && list.every((d) => d.shareGroup === group)) continue;
    problems.push({
      severity: 'error',
      code: 'pin-used-twice',
      pins: [pin],
      roles: list.map((d) => d.roleName),
      message: `${pin} is used for ${listWords(list.map((d) => d.label))}.`,
      hint: 'Give each role its own pin; only the standby lines of chips of one kind may share a pin.',
      path: list[1].path,
    });
  }
  return problems;
}

export function checkPinRoles(ctx: PlanContext): Problem[] {
  const used = new Set(ctx.demands.map((d) => d.pin).filter((p): p is string => p !== null));
  return [...ctx.demands.flatMap((d) => checkOne(ctx, d, used)), ...checkShared(ctx)];
}
