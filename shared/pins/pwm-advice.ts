import { defaultPwmHz, findPin, timerOfPin } from '../boards/boards';
import type { BoardPin, BoardProfile } from '../boards/board-types';
import { formatHz, pwmSettingForPin } from '../boards/pwm-timing';
import { DRIVER_KINDS } from '../drivers/driver-kinds';
import type { DriverKindId } from '../schemas/ids';
import type { RobotConfig } from '../schemas/robot-config';
import { collectDemands, type PinDemand } from './pin-demands';
import { busReason, planContexts, type PlanContext } from './plan-context';

/**
 * Human hearing reaches about 20 kHz, so PWM at or above it does not whine (common practice).
 * Higher frequencies cost switching losses in the driver, so Mixwright suggests the lowest
 * inaudible one the driver accepts.
 */
export const INAUDIBLE_HZ = 20_000;

export interface PinRunning {
  roleId: string;
  pin: string | null;
  actualHz: number | null;
  formula: string | null;
}

export interface QuietPin {
  pin: string;
  hz: number;
  formula: string;
}

export interface DriverPwmAdvice {
  driverIndex: number;
  driverName: string;
  kind: DriverKindId;
  maxHz: number | null;
  /** The frequency to set; null for servo-pulse ESCs. */
  suggestedHz: number | null;
  suggestion: string;
  /** What each PWM role runs at with the pins and frequency as they are. */
  running: PinRunning[];
  /** Pins whose timer or slice can run a quiet frequency without disturbing millis(), servo pulses or other drivers. */
  quietPins: QuietPin[];
  /** What keeping the board's default frequency means. */
  defaultNote: string;
}

function defaultNote(board: BoardProfile): string {
  if (board.family === 'avr') {
    const t0 = board.timers.find((t) => t.id === 0)!;
    const t1 = board.timers.find((t) => t.id === 1)!;
    return `Left at the board’s default, PWM runs at ${formatHz(t1.defaultHz)} (${t1.defaultFormula}) and at ${formatHz(t0.defaultHz)} on timer 0 (${t0.defaultFormula}): well within hearing, so the motors whine, most at low speed.`;
  }
  // The ESP32 and RP2040 cores' default analogWrite frequency is from memory, hence "about".
  return `Left at the core’s default, analogWrite runs at about ${formatHz(board.defaultPwmHz['*'])}: within hearing, so the motors whine, most at low speed.`;
}

/** Whether two PWM pins share a timer (AVR) or a slice (RP2040), and so one frequency. */
function sharesFrequency(a: BoardPin, b: BoardPin): boolean {
  const pa = a.pwm!;
  const pb = b.pwm!;
  if ('timer' in pa && 'timer' in pb) return pa.timer === pb.timer;
  if ('slice' in pa && 'slice' in pb) return pa.slice === pb.slice;
  return false;
}

function quietPins(ctx: PlanContext, driverIndex: number, maxHz: number, suggested: number): QuietPin[] {
  const othersPlaced = ctx.demands
    .filter((d) => d.driverIndex !== driverIndex && d.pin !== null)
    .map((d) => ({ demand: d, pin: findPin(ctx.board, d.pin!) }))
    .filter((o): o is { demand: PinDemand; pin: BoardPin } => o.pin !== undefined);
  const taken = new Set(othersPlaced.map((o) => o.pin.id));
  const quiet: QuietPin[] = [];
  for (const pin of ctx.board.pins) {
    if (
      !pin.pwm ||
      !pin.onHeader ||
      pin.inputOnly ||
      pin.flash ||
      pin.strapping ||
      taken.has(pin.id) ||
      busReason(ctx, pin)
    )
      continue;
    const timer = timerOfPin(ctx.board, pin);
    if (timer && (timer.id === 0 || ctx.servoTimerIds.includes(timer.id))) continue;
    // The suggestion itself, else what an 8-bit timer gives flat out (timer 2: 31.4 kHz).
    const setting = [
      pwmSettingForPin(ctx.board, pin, suggested, maxHz),
      pwmSettingForPin(ctx.board, pin, maxHz, maxHz),
    ].find((s) => s && s.actualHz >= INAUDIBLE_HZ * 0.98 && s.actualHz <= maxHz);
    if (!setting) continue;
    const disturbs = othersPlaced.some(
      ({ demand, pin: other }) =>
        other.pwm &&
        (demand.need === 'pwm' || (demand.need === 'servo-pulse' && ctx.board.family !== 'avr')) &&
        sharesFrequency(pin, other) &&
        demand.requestedHz !== setting.actualHz,
    );
    if (!disturbs) quiet.push({ pin: pin.id, hz: setting.actualHz, formula: setting.formula });
  }
  return quiet;
}

function suggestionText(
  board: BoardProfile,
  maxHz: number | null,
  suggested: number | null,
  quiet: QuietPin[],
): string {
  if (maxHz === null || suggested === null)
    return 'An ESC reads servo pulses at 50 Hz and makes its own PWM; there is nothing to set here.';
  if (suggested < INAUDIBLE_HZ)
    return `This driver accepts at most ${formatHz(maxHz)}, below hearing’s upper limit: set ${formatHz(suggested)} for the least whine it allows.`;
  if (quiet.length === 0)
    return `Set ${formatHz(suggested)} to stop the whine, but no free pin on the ${board.shortName} can run it without disturbing millis(), servo pulses or another driver.`;
  const where = board.family === 'avr' ? ` on ${quiet.map((q) => q.pin).join(', ')}` : '';
  return `Set ${formatHz(suggested)}: above hearing and within the driver’s ${formatHz(maxHz)}; it runs cleanly${where}.`;
}

export function pwmAdvice(config: RobotConfig): DriverPwmAdvice[] {
  const [ctx] = planContexts(config, collectDemands(config));
  return config.wiring.drivers.map((driver, driverIndex) => {
    const kind = DRIVER_KINDS[driver.kind];
    const maxHz = kind.maxPwmHz;
    const suggestedHz = maxHz === null ? null : Math.min(maxHz, INAUDIBLE_HZ);
    const quiet =
      maxHz !== null && suggestedHz !== null && suggestedHz >= INAUDIBLE_HZ
        ? quietPins(ctx, driverIndex, maxHz, suggestedHz)
        : [];
    const running = ctx.demands
      .filter((d) => d.driverIndex === driverIndex && d.need === 'pwm')
      .map((d): PinRunning => {
        const pin = d.pin ? findPin(ctx.board, d.pin) : undefined;
        const setting = pin ? pwmSettingForPin(ctx.board, pin, d.requestedHz, d.ceilingHz) : null;
        return {
          roleId: d.roleId,
          pin: d.pin,
          actualHz: setting?.actualHz ?? (pin ? defaultPwmHz(ctx.board, pin) : null),
          formula: setting?.formula ?? null,
        };
      });
    return {
      driverIndex,
      driverName: driver.name,
      kind: driver.kind,
      maxHz,
      suggestedHz,
      suggestion: suggestionText(ctx.board, maxHz, suggestedHz, quiet),
      running,
      quietPins: quiet,
      defaultNote: defaultNote(ctx.board),
    };
  });
}
