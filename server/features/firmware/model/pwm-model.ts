import type { RobotConfig } from '@shared/schemas/robot-config';
import { findPin } from '@shared/boards/boards';
import type { BoardProfile } from '@shared/boards/board-types';
import { formatHz, pwmSettingForPin, type PwmSetting } from '@shared/boards/pwm-timing';
import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import type { IssueList } from './firmware-config-error';
import type { MotorWiring } from './output-model';

/** One AVR timer the firmware re-programs, as the pin plan's PWM timing says. */
export interface AvrTimerSetting {
  timer: number;
  /** Clock-select bits for TCCRnB (position of the prescaler in the timer's list, plus one). */
  clockSelect: number;
  /** 16-bit timer in phase-correct mode 10 with ICRn as TOP; otherwise TOP stays 255. */
  icrTop: number | null;
  /** 8-bit timer: fast PWM (mode 3) or phase-correct (mode 1). */
  fast: boolean;
  hz: string;
  asked: number;
}

/** A PWM pin on a timer with its own TOP: duty is scaled to it and written to OCRnx directly. */
export interface TopPin {
  macro: string;
  timer: number;
  channel: string;
  /** round(TOP × 257): duty × this >> 16 is duty × TOP / 255 (1/255 ≈ 257/65536). */
  scale: number;
}

export interface PwmModel {
  max: number;
  avrTimers: AvrTimerSetting[];
  topPins: TopPin[];
  /** ESP32 and RP2040: one frequency for all PWM outputs. */
  frequencyHz: number;
  bits: number;
  pinMacros: string[];
  notes: string[];
}

export interface ServoModel {
  present: boolean;
  count: number;
  timer: number;
  pinMacros: string[];
}

/** Up to 8 pulses of at most 2.2 ms fit one 20 ms servo frame. */
export const MAX_SERVO_OUTPUTS = 8;
/** The control step's duty arithmetic holds at most 14-bit duties (Q14 × max < 2^28). */
const MAX_DUTY_BITS = 14;

interface PinSetting {
  macro: string;
  /** The timer output ('A', 'B', 'C') on AVR. */
  channel: string | null;
  setting: PwmSetting;
  asked: number | null;
}

/** Each driver PWM pin with the setting the pin plan's timing function gives it. */
function pinSettings(config: RobotConfig, board: BoardProfile, wiring: MotorWiring[]): PinSetting[] {
  return wiring.flatMap((motor) => {
    const driver = config.wiring.drivers[motor.driverIndex];
    const ceiling = DRIVER_KINDS[driver.kind].maxPwmHz ?? Infinity;
    return motor.pwmPins.flatMap(({ macro, pinId }) => {
      const pin = findPin(board, pinId);
      const setting = pin ? pwmSettingForPin(board, pin, driver.pwmFrequencyHz, ceiling) : null;
      const channel = pin?.pwm && 'timer' in pin.pwm ? pin.pwm.channel : null;
      return setting ? [{ macro, channel, setting, asked: driver.pwmFrequencyHz }] : [];
    });
  });
}

/**
 * AVR: the timers to re-program (never timer 0, which keeps millis()), and the pins whose
 * timer then has its own TOP. The pin check refuses two frequencies on one timer, so the
 * first request for a timer is the only one.
 */
function avrModel(settings: PinSetting[], board: BoardProfile) {
  const timers = new Map<number, AvrTimerSetting>();
  const topPins: TopPin[] = [];
  for (const { macro, channel, setting, asked } of settings) {
    const avr = setting.avr;
    if (!avr || asked === null || avr.timer === 0) continue;
    const timer = board.timers.find((t) => t.id === avr.timer)!;
    if (!timers.has(avr.timer)) {
      timers.set(avr.timer, {
        timer: avr.timer,
        clockSelect: timer.prescalers.indexOf(avr.prescaler) + 1,
        icrTop: avr.topRegister === 'ICR' ? avr.top : null,
        fast: avr.mode === 'fast',
        hz: formatHz(setting.actualHz),
        asked,
      });
    }
    if (avr.topRegister === 'ICR' && channel)
      topPins.push({ macro, timer: avr.timer, channel, scale: Math.round(avr.top * 257) });
  }
  return { timers: [...timers.values()].sort((a, b) => a.timer - b.timer), topPins };
}

export function buildPwmModel(config: RobotConfig, board: BoardProfile, wiring: MotorWiring[]): PwmModel {
  const notes: string[] = [];
  const settings = pinSettings(config, board, wiring);
  const pinMacros = settings.map((s) => s.macro);
  const described = new Set<string>();
  for (const { setting, asked } of settings) {
    if (asked === null) continue;
    const where = setting.avr ? `timer ${setting.avr.timer}` : 'the PWM outputs';
    const text =
      setting.avr?.timer === 0
        ? `PWM on timer 0 stays at ${formatHz(setting.actualHz)}: millis() and micros() run on that timer.`
        : `PWM on ${where}: ${setting.formula}${setting.exact ? '' : ` (asked for ${formatHz(asked)})`}.`;
    if (!described.has(text)) notes.push(text);
    described.add(text);
  }
  if (board.family === 'avr') {
    const { timers, topPins } = avrModel(settings, board);
    return { max: 255, avrTimers: timers, topPins, frequencyHz: 0, bits: 8, pinMacros, notes };
  }
  const frequencyHz = Math.round(
    settings.find((s) => s.asked !== null)?.setting.actualHz ?? board.defaultPwmHz['*'] ?? 1000,
  );
  if (board.family === 'esp32') {
    const bits = Math.min(MAX_DUTY_BITS, Math.max(...settings.map((s) => s.setting.ledc?.bits ?? MAX_DUTY_BITS), 1));
    return { max: 2 ** bits - 1, avrTimers: [], topPins: [], frequencyHz, bits, pinMacros, notes };
  }
  return { max: 1023, avrTimers: [], topPins: [], frequencyHz, bits: 10, pinMacros, notes };
}

export function buildServoModel(board: BoardProfile, pinMacros: string[], issues: IssueList): ServoModel {
  if (pinMacros.length > MAX_SERVO_OUTPUTS) {
    issues.add(['wiring', 'drivers'], `At most ${MAX_SERVO_OUTPUTS} servo-pulse ESCs fit one 20 ms pulse frame`);
  }
  return {
    present: pinMacros.length > 0,
    count: pinMacros.length,
    timer: board.family === 'avr' ? (board.servoTimerOrder[0] ?? 1) : 0,
    pinMacros,
  };
}
