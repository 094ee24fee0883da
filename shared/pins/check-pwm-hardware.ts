import { defaultPwmHz, findPin, timerOfPin } from '../boards/boards';
import type { BoardPin } from '../boards/board-types';
import { formatHz, pwmSettingForPin } from '../boards/pwm-timing';
import type { Problem } from '../problems/problem';
import type { PinDemand } from './pin-demands';
import { capitalize, listWords, type PlanContext } from './plan-context';
import { pwmBudget, pwmBudgetSentence } from './pwm-budget';

// Checks of the PWM hardware behind the pins: AVR timers shared by several pins, timer 0 under
// millis(), the Servo library's timers, RP2040 slices and ESP32 LEDC channels (REFERENCES §2–4).

interface PwmUser {
  demand: PinDemand;
  pin: BoardPin;
}

/** Roles that drive PWM hardware, on pins that have it. Servo pulses count outside AVR. */
function pwmUsers(ctx: PlanContext, includeServo: boolean): PwmUser[] {
  const users: PwmUser[] = [];
  for (const demand of ctx.demands) {
    if (demand.need !== 'pwm' && !(includeServo && demand.need === 'servo-pulse')) continue;
    const pin = demand.pin ? findPin(ctx.board, demand.pin) : undefined;
    if (pin?.pwm) users.push({ demand, pin });
  }
  return users;
}

function groupBy<T>(items: T[], key: (item: T) => string): Map<string, T[]> {
  const map = new Map<string, T[]>();
  for (const item of items) map.set(key(item), [...(map.get(key(item)) ?? []), item]);
  return map;
}

function usersProblem(
  severity: Problem['severity'],
  code: string,
  users: PwmUser[],
  message: string,
  hint: string,
): Problem {
  return {
    severity,
    code,
    pins: [...new Set(users.map((u) => u.pin.id))],
    roles: users.map((u) => u.demand.roleName),
    message,
    hint,
    path: users[users.length - 1].demand.path,
  };
}

function driverName(ctx: PlanContext, d: PinDemand): string {
  return d.driverIndex === null ? d.label : ctx.config.wiring.drivers[d.driverIndex].name;
}

function checkAvrTimers(ctx: PlanContext): Problem[] {
  const problems: Problem[] = [];
  const users = pwmUsers(ctx, false);
  for (const u of users) {
    const timer = timerOfPin(ctx.board, u.pin);
    if (!timer) continue;
    if (ctx.servoTimerIds.includes(timer.id)) {
      problems.push(
        usersProblem(
          'error',
          'servo-timer-pwm',
          [u],
          `${u.pin.id} is on timer ${timer.id}, which the servo pulses for the ESCs take: ${u.demand.label} gets no PWM there.`,
          `Move it to a pin on a timer the servo pulses leave alone.`,
        ),
      );
      continue;
    }
    const requested = u.demand.requestedHz;
    const setting = pwmSettingForPin(ctx.board, u.pin, requested, u.demand.ceilingHz);
    if (requested === null || !setting || setting.exact) continue;
    if (timer.id === 0) {
      problems.push(
        usersProblem(
          'error',
          'timer0-millis',
          [u],
          `${u.pin.id} is on timer 0, which runs ${timer.coreUse}: it stays at ${formatHz(timer.defaultHz)}, so ${driverName(ctx, u.demand)}’s ${formatHz(requested)} cannot be set there.`,
          'Move it to a pin on another timer, or leave the driver at the board’s default frequency.',
        ),
      );
    } else {
      problems.push(
        usersProblem(
          'warning',
          'pwm-frequency-not-exact',
          [u],
          `${u.pin.id} is on timer ${timer.id}, which cannot make ${formatHz(requested)} on both its outputs: it will run at ${formatHz(setting.actualHz)} (${setting.formula}).`,
          'Accept that frequency, or use a pin on a 16-bit timer, which can run it exactly.',
        ),
      );
    }
  }
  for (const [timerId, group] of groupBy(users, (u) => String(timerOfPin(ctx.board, u.pin)?.id ?? 'none'))) {
    if (timerId === 'none' || timerId === '0' || ctx.servoTimerIds.includes(Number(timerId))) continue;
    problems.push(...checkTimerGroup(ctx, Number(timerId), group));
  }
  return problems;
}

function checkTimerGroup(ctx: PlanContext, timerId: number, group: PwmUser[]): Problem[] {
  const asked = [...new Set(group.map((u) => u.demand.requestedHz).filter((f): f is number => f !== null))];
  const pins = listWords([...new Set(group.map((u) => u.pin.id))]);
  if (asked.length > 1) {
    const who = listWords(
      asked.map(
        (f) => `${driverName(ctx, group.find((u) => u.demand.requestedHz === f)!.demand)} asks for ${formatHz(f)}`,
      ),
    );
    return [
      usersProblem(
        'error',
        'timer-frequency-clash',
        group,
        `Timer ${timerId} drives ${pins} at one frequency, but ${who}.`,
        'Give these drivers the same PWM frequency, or move one to a pin on another timer.',
      ),
    ];
  }
  if (asked.length === 1) {
    const changer = group.find((u) => u.demand.requestedHz !== null)!;
    const others = group.filter(
      (u) => u.demand.requestedHz === null && u.demand.driverIndex !== changer.demand.driverIndex,
    );
    if (others.length > 0) {
      const defaultHz = ctx.board.timers.find((t) => t.id === timerId)!.defaultHz;
      return [
        usersProblem(
          'warning',
          'timer-frequency-changes-others',
          [changer, ...others],
          `${capitalize(driverName(ctx, changer.demand))}’s ${formatHz(asked[0])} on timer ${timerId} also changes ${listWords(others.map((u) => `${u.pin.id} (${u.demand.label})`))}, which expects the default ${formatHz(defaultHz)}.`,
          'Set the same frequency on that driver too, or move it to a pin on another timer.',
        ),
      ];
    }
  }
  return [];
}

function effectiveHz(ctx: PlanContext, u: PwmUser): number {
  return u.demand.requestedHz ?? defaultPwmHz(ctx.board, u.pin) ?? 1000;
}

function checkSlices(ctx: PlanContext): Problem[] {
  const problems: Problem[] = [];
  const users = pwmUsers(ctx, true);
  const slice = (u: PwmUser) => (u.pin.pwm && 'slice' in u.pin.pwm ? u.pin.pwm : null);
  for (const [key, group] of groupBy(users, (u) => `${slice(u)?.slice}${slice(u)?.channel}`)) {
    if (new Set(group.map((u) => u.pin.id)).size < 2) continue;
    problems.push(
      usersProblem(
        'error',
        'slice-channel-shared',
        group,
        `${listWords([...new Set(group.map((u) => u.pin.id))])} share PWM slice ${key.slice(0, -1)} channel ${key.slice(-1)}, so they always carry the same duty cycle.`,
        'Move one of them to a GPIO on another slice channel (GPIO n and n + 16 share one).',
      ),
    );
  }
  for (const [sliceId, group] of groupBy(users, (u) => String(slice(u)?.slice))) {
    const freqs = [...new Set(group.map((u) => effectiveHz(ctx, u)))];
    if (freqs.length < 2) continue;
    const who = listWords(group.map((u) => `${u.demand.label} ${formatHz(effectiveHz(ctx, u))}`));
    problems.push(
      usersProblem(
        'error',
        'slice-frequency-clash',
        group,
        `PWM slice ${sliceId} runs both its channels at one frequency, but it is asked for ${who}.`,
        'Move one role to a GPIO on another slice, or give both the same frequency.',
      ),
    );
  }
  return problems;
}

function checkLedc(ctx: PlanContext): Problem[] {
  const units = ctx.board.pwmUnits;
  if (units.kind !== 'ledc') return [];
  const users = pwmUsers(ctx, true);
  const pins = new Set(users.map((u) => u.pin.id));
  if (pins.size <= units.channels) return [];
  return [
    usersProblem(
      'error',
      'ledc-channels-exhausted',
      users,
      `${pins.size} pins need PWM, but the ${ctx.board.shortName} has ${units.channels} LEDC channels.`,
      'Use drivers with fewer PWM inputs (PWM + direction needs one per motor).',
    ),
  ];
}

function checkBudget(ctx: PlanContext): Problem[] {
  const budget = pwmBudget(ctx);
  if (budget.needed <= budget.available) return [];
  return [
    {
      severity: 'error',
      code: 'too-few-pwm-pins',
      pins: [],
      roles: ctx.demands
        .filter((d) => d.need === 'pwm' || (d.need === 'servo-pulse' && ctx.board.family !== 'avr'))
        .map((d) => d.roleName),
      message: `${capitalize(pwmBudgetSentence(ctx, budget))}.`,
      hint: 'Use drivers with fewer PWM inputs (PWM + direction and TB6612-class drivers need one per motor), or a board with more PWM outputs.',
      path: ['wiring', 'drivers'],
    },
  ];
}

export function checkPwmHardware(ctx: PlanContext): Problem[] {
  if (ctx.side !== 'robot') return [];
  const family = ctx.board.family;
  const specific = family === 'avr' ? checkAvrTimers(ctx) : family === 'rp2040' ? checkSlices(ctx) : checkLedc(ctx);
  return [...checkBudget(ctx), ...specific];
}
