import type { AvrTimer, BoardPin, BoardProfile } from './board-types';
import { defaultPwmHz, timerOfPin } from './boards';

/**
 * How a pin would be set up to run a PWM frequency. The firmware generator and the pin check
 * both use this, so what the check promises is what the firmware does.
 */
export interface PwmSetting {
  requestedHz: number | null;
  actualHz: number;
  /** Duty-cycle steps from off to full. */
  steps: number;
  /** Within 2 % of the request (always true for the default). */
  exact: boolean;
  /** The frequency can be changed on this pin without touching millis(). */
  changeable: boolean;
  /** Every output of the timer keeps its PWM at this setting. */
  keepsAllChannels: boolean;
  avr?: { timer: number; mode: 'fast' | 'phase-correct'; prescaler: number; top: number; topRegister: 'fixed' | 'ICR' };
  ledc?: { bits: number };
  rp2040?: { divider: number; wrap: number };
  /** The arithmetic, for the advice text. */
  formula: string;
}

const EXACT_TOLERANCE = 0.02;

/** 20000 → "20 kHz", 31372.5 → "31.4 kHz", 7812.5 → "7.81 kHz", 490.196 → "490.2 Hz". */
function hz(value: number): string {
  const trim = (text: string) => text.replace(/\.0+$|(\.\d*?)0+$/, '$1');
  if (value >= 1000) return `${trim((value / 1000).toFixed(value >= 10000 ? 1 : 2))} kHz`;
  return `${trim(value.toFixed(1))} Hz`;
}

function mhz(value: number): string {
  return `${value / 1e6} MHz`;
}

/** The board's default setting for a timer: 8-bit, prescaler 64 (Arduino AVR core wiring.c). */
function avrDefault(board: BoardProfile, timer: AvrTimer): PwmSetting {
  const fast = timer.id === 0;
  return {
    requestedHz: null,
    actualHz: timer.defaultHz,
    steps: 255,
    exact: true,
    changeable: timer.id !== 0,
    keepsAllChannels: true,
    avr: { timer: timer.id, mode: fast ? 'fast' : 'phase-correct', prescaler: 64, top: 255, topRegister: 'fixed' },
    formula: `${mhz(board.cpuHz)} / 64 / ${fast ? 256 : 510} = ${hz(timer.defaultHz)}`,
  };
}

/**
 * A 16-bit timer in phase-correct PWM with ICRn as TOP (ATmega328P/2560 datasheets, 16-bit
 * timer, mode 10): f = F_CPU / (2 · N · TOP); every output channel keeps its PWM.
 */
function avr16(board: BoardProfile, timer: AvrTimer, f: number, ceiling: number): PwmSetting | null {
  for (const n of timer.prescalers) {
    let top = Math.round(board.cpuHz / (2 * n * f));
    if (top > 65535) continue;
    top = Math.max(top, 2);
    while (board.cpuHz / (2 * n * top) > ceiling && top < 65535) top += 1;
    const actualHz = board.cpuHz / (2 * n * top);
    return {
      requestedHz: f,
      actualHz,
      steps: top,
      exact: Math.abs(actualHz - f) / f <= EXACT_TOLERANCE,
      changeable: true,
      keepsAllChannels: true,
      avr: { timer: timer.id, mode: 'phase-correct', prescaler: n, top, topRegister: 'ICR' },
      formula: `${mhz(board.cpuHz)} / (2 × ${n} × ${top}) = ${hz(actualHz)}`,
    };
  }
  return null;
}

/**
 * An 8-bit timer keeping both outputs: TOP is fixed at 255, so only the prescaler and the mode
 * choose the frequency: fast F/(N·256) or phase-correct F/(N·510) (datasheet, 8-bit timer modes).
 */
function avr8(board: BoardProfile, timer: AvrTimer, f: number, ceiling: number): PwmSetting {
  const candidates = timer.prescalers.flatMap((n) => [
    { n, mode: 'fast' as const, divisor: 256, actualHz: board.cpuHz / (n * 256) },
    { n, mode: 'phase-correct' as const, divisor: 510, actualHz: board.cpuHz / (n * 510) },
  ]);
  const allowed = candidates.filter((c) => c.actualHz <= ceiling);
  const pool = allowed.length > 0 ? allowed : candidates;
  const best = pool.reduce((a, b) => (Math.abs(Math.log(b.actualHz / f)) < Math.abs(Math.log(a.actualHz / f)) ? b : a));
  return {
    requestedHz: f,
    actualHz: best.actualHz,
    steps: 255,
    exact: Math.abs(best.actualHz - f) / f <= EXACT_TOLERANCE,
    changeable: true,
    keepsAllChannels: true,
    avr: { timer: timer.id, mode: best.mode, prescaler: best.n, top: 255, topRegister: 'fixed' },
    formula: `${mhz(board.cpuHz)} / ${best.n} / ${best.divisor} = ${hz(best.actualHz)}`,
  };
}

/** LEDC duty resolution: floor(log2(80 MHz / f)) bits, at most 20 (REFERENCES §3). */
export function ledcResolutionBits(clockHz: number, f: number, maxBits: number): number {
  return Math.max(1, Math.min(maxBits, Math.floor(Math.log2(clockHz / f))));
}

/** RP2040 slice: f = clk / (div · (wrap + 1)), wrap ≤ 65535, integer divider 1–255 (RP2040 datasheet, PWM). */
export function rp2040PwmSetting(cpuHz: number, f: number): { divider: number; wrap: number; actualHz: number } {
  const divider = Math.min(255, Math.max(1, Math.ceil(cpuHz / (f * 65536))));
  const wrap = Math.min(65535, Math.max(1, Math.round(cpuHz / (divider * f)) - 1));
  return { divider, wrap, actualHz: cpuHz / (divider * (wrap + 1)) };
}

/**
 * The setting a pin gets for a requested frequency (null = the board's default), never above
 * `ceilingHz` where the hardware allows a lower one. Null for a pin without PWM.
 */
export function pwmSettingForPin(
  board: BoardProfile,
  pin: BoardPin,
  requestedHz: number | null,
  ceilingHz = Infinity,
): PwmSetting | null {
  if (!pin.pwm) return null;
  const fallback = defaultPwmHz(board, pin) ?? 1000;
  const timer = timerOfPin(board, pin);
  if (timer) {
    if (requestedHz === null || timer.id === 0)
      return {
        ...avrDefault(board, timer),
        requestedHz,
        exact: requestedHz === null || Math.abs(timer.defaultHz - requestedHz) / requestedHz <= EXACT_TOLERANCE,
      };
    return timer.bits === 16
      ? (avr16(board, timer, requestedHz, ceilingHz) ?? avrDefault(board, timer))
      : avr8(board, timer, requestedHz, ceilingHz);
  }
  const f = requestedHz ?? fallback;
  const units = board.pwmUnits;
  if (units.kind === 'ledc') {
    const bits = ledcResolutionBits(units.clockHz, f, units.maxBits);
    return {
      requestedHz,
      actualHz: f,
      steps: 2 ** bits,
      exact: true,
      changeable: true,
      keepsAllChannels: true,
      ledc: { bits },
      formula: `floor(log2(${mhz(units.clockHz)} / ${hz(f)})) = ${bits} bits`,
    };
  }
  const s = rp2040PwmSetting(board.cpuHz, f);
  return {
    requestedHz,
    actualHz: s.actualHz,
    steps: s.wrap + 1,
    exact: Math.abs(s.actualHz - f) / f <= EXACT_TOLERANCE,
    changeable: true,
    keepsAllChannels: true,
    rp2040: { divider: s.divider, wrap: s.wrap },
    formula: `${mhz(board.cpuHz)} / (${s.divider} × ${s.wrap + 1}) = ${hz(s.actualHz)}`,
  };
}

export { hz as formatHz };
