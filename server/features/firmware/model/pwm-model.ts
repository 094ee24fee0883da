import type { RobotConfig } from '@shared/schemas/robot-config';
import { findPin } from '@shared/boards/boards';
import type { BoardProfile } from '@shared/boards/board-types';
import type { IssueList } from './firmware-config-error';
import type { MotorWiring } from './output-model';

export interface AvrTimerSetting {
  timer: number;
  clockSelect: number;
  hz: number;
  asked: number;
}

export interface PwmModel {
  max: number;
  /** AVR: timers whose prescaler changes (never timer 0). */
  avrTimers: AvrTimerSetting[];
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

const F_CPU = 16_000_000;
// ESP32 LEDC runs from the 80 MHz APB clock: at most floor(log2(80 MHz / f)) bits (REFERENCES §3).
const LEDC_CLOCK = 80_000_000;
/** Up to 8 pulses of at most 2.2 ms fit one 20 ms servo frame. */
export const MAX_SERVO_OUTPUTS = 8;

/** AVR timers 1–5 in the core's 8-bit phase-correct mode: f = 16 MHz / prescaler / 510. */
function nearestPrescaler(prescalers: number[], asked: number): { index: number; hz: number } {
  let best = { index: 0, hz: F_CPU / prescalers[0] / 510 };
  for (let i = 1; i < prescalers.length; i++) {
    const hz = F_CPU / prescalers[i] / 510;
    if (Math.abs(Math.log(hz / asked)) < Math.abs(Math.log(best.hz / asked))) best = { index: i, hz };
  }
  return best;
}

function avrTimers(config: RobotConfig, board: BoardProfile, wiring: MotorWiring[], notes: string[]): AvrTimerSetting[] {
  const settings = new Map<number, AvrTimerSetting>();
  for (const motor of wiring) {
    const asked = config.wiring.drivers[motor.driverIndex].pwmFrequencyHz;
    if (asked === null) continue;
    for (const { pinId } of motor.pwmPins) {
      const pwm = findPin(board, pinId)?.pwm;
      if (!pwm || !('timer' in pwm)) continue;
      if (pwm.timer === 0) {
        notes.push(`Pin ${pinId} stays at the default PWM frequency: timer 0 also runs millis() and micros().`);
        continue;
      }
      const timer = board.timers.find((t) => t.id === pwm.timer);
      if (!timer) continue;
      const { index, hz } = nearestPrescaler(timer.prescalers, asked);
      const existing = settings.get(timer.id);
      if (existing && existing.clockSelect !== index + 1) {
        notes.push(`Timer ${timer.id} runs at ${existing.hz} Hz for an earlier driver; pin ${pinId} shares it.`);
        continue;
      }
      settings.set(timer.id, { timer: timer.id, clockSelect: index + 1, hz: Math.round(hz), asked });
    }
  }
  return [...settings.values()].sort((a, b) => a.timer - b.timer);
}

function sharedFrequency(config: RobotConfig, board: BoardProfile): number {
  const asked = config.wiring.drivers.map((d) => d.pwmFrequencyHz).filter((f): f is number => f !== null);
  return asked.length > 0 ? Math.max(...asked) : Math.round(board.defaultPwmHz['*'] ?? 1000);
}

export function buildPwmModel(config: RobotConfig, board: BoardProfile, wiring: MotorWiring[]): PwmModel {
  const notes: string[] = [];
  const pinMacros = wiring.flatMap((w) => w.pwmPins.map((p) => p.macro));
  if (board.family === 'avr') {
    return { max: 255, avrTimers: avrTimers(config, board, wiring, notes), frequencyHz: 0, bits: 8, pinMacros, notes };
  }
  const frequencyHz = sharedFrequency(config, board);
  if (board.family === 'esp32') {
    const bits = Math.min(10, Math.floor(Math.log2(LEDC_CLOCK / frequencyHz)));
    return { max: 2 ** bits - 1, avrTimers: [], frequencyHz, bits, pinMacros, notes };
  }
  const distinct = new Set(config.wiring.drivers.map((d) => d.pwmFrequencyHz).filter((f) => f !== null));
  if (distinct.size > 1) notes.push(`Every PWM output runs at ${frequencyHz} Hz: the core sets one frequency for all.`);
  return { max: 1023, avrTimers: [], frequencyHz, bits: 10, pinMacros, notes };
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
