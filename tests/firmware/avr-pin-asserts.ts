import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BoardProfile } from '@shared/boards/board-types';

// Writes our AVR pin tables as C++ static_asserts against the Arduino AVR core's own
// variants/<v>/pins_arduino.h (Debian package arduino-core-avr) and compiles them with
// avr-g++ -fsyntax-only (recipe: ../shared/FIRMWARE.md "Checking pin tables against the core").

export const AVR_CORE = '/usr/share/arduino/hardware/arduino/avr';

export interface AvrTarget {
  mcu: string;
  variant: string;
  define: string;
}

export const AVR_TARGETS: Record<string, AvrTarget> = {
  uno: { mcu: 'atmega328p', variant: 'standard', define: 'ARDUINO_AVR_UNO' },
  nano: { mcu: 'atmega328p', variant: 'eightanaloginputs', define: 'ARDUINO_AVR_NANO' },
  mega2560: { mcu: 'atmega2560', variant: 'mega', define: 'ARDUINO_AVR_MEGA2560' },
};

function flags(target: AvrTarget): string[] {
  return [
    '-std=gnu++11',
    '-Os',
    `-mmcu=${target.mcu}`,
    '-DF_CPU=16000000L',
    '-DARDUINO=10819',
    `-D${target.define}`,
    '-DARDUINO_ARCH_AVR',
    `-I${AVR_CORE}/cores/arduino`,
    `-I${AVR_CORE}/variants/${target.variant}`,
  ];
}

/**
 * The core's digital_pin_to_timer_PGM initializer, after the preprocessor has picked the
 * right branch for the MCU. It sits in PROGMEM, so it cannot be read in a constant expression;
 * the test copies it into a constexpr array and asserts against that copy.
 */
export function coreTimerTable(target: AvrTarget): string {
  const text = execFileSync(
    'avr-g++',
    [
      '-E',
      '-P',
      `-mmcu=${target.mcu}`,
      '-DARDUINO_MAIN',
      '-x',
      'c++',
      '-include',
      'avr/io.h',
      `${AVR_CORE}/variants/${target.variant}/pins_arduino.h`,
    ],
    { encoding: 'utf8' },
  ).replace(/\s+/g, ' ');
  const match = /digital_pin_to_timer_PGM\[\] = \{([^}]*)\}/.exec(text);
  if (!match) throw new Error(`No timer table in ${target.variant}/pins_arduino.h`);
  return match[1];
}

/** Our digital pin number for a pin id: D-pins by number, A-pins after the last D-pin. */
function digitalNumber(board: BoardProfile, id: string): number {
  const digitalCount = board.pins.filter((p) => p.id.startsWith('D')).length;
  return id.startsWith('A') ? digitalCount + Number(id.slice(1)) : Number(id.slice(1));
}

export function pinTableAsserts(board: BoardProfile, timerTable: string): string {
  const lines = ['#include <Arduino.h>', `constexpr uint8_t coreTimers[] = {${timerTable}};`];
  const check = (expr: string, what: string) => lines.push(`static_assert(${expr}, "${board.id}: ${what}");`);
  const digital = board.pins.filter((p) => p.digital);
  check(`NUM_DIGITAL_PINS == ${digital.length}`, `${digital.length} digital pins`);
  for (const pin of board.pins) {
    const n = digitalNumber(board, pin.id);
    if (pin.id.startsWith('A')) {
      check(`${pin.id} == ${n}`, `${pin.id} is digital pin ${n}`);
      // The core maps only analog inputs that double as digital pins; A6/A7 give -1.
      const mapped = pin.digital ? n : -1;
      check(
        `analogInputToDigitalPin(${pin.id.slice(1)}) == ${mapped}`,
        `analog input ${pin.id.slice(1)} maps to ${mapped}`,
      );
    }
    if (!pin.digital) {
      check(`${pin.code} >= NUM_DIGITAL_PINS`, `${pin.id} is not a digital pin`);
      continue;
    }
    check(`${n} < NUM_DIGITAL_PINS`, `${pin.id} is a digital pin`);
    check(`${pin.pwm ? '' : '!'}digitalPinHasPWM(${n})`, `${pin.id} ${pin.pwm ? 'has' : 'has no'} PWM`);
    const timer = pin.pwm && 'timer' in pin.pwm ? `TIMER${pin.pwm.timer}${pin.pwm.channel}` : 'NOT_ON_TIMER';
    check(`coreTimers[${n}] == ${timer}`, `${pin.id} is on ${timer}`);
    const interrupt = pin.externalInterrupt ?? 'NOT_AN_INTERRUPT';
    check(`digitalPinToInterrupt(${n}) == ${interrupt}`, `${pin.id} external interrupt ${interrupt}`);
    check(
      `${pin.pinChange ? '' : '!'}(digitalPinToPCICR(${n}) != 0)`,
      `${pin.id} ${pin.pinChange ? 'has' : 'has no'} pin-change interrupt`,
    );
  }
  const spi = board.spi;
  for (const [macro, id] of [
    ['SS', spi.ss],
    ['MOSI', spi.mosi],
    ['MISO', spi.miso],
    ['SCK', spi.sck],
    ['SDA', board.i2c.sda],
    ['SCL', board.i2c.scl],
  ]) {
    check(`${macro} == ${digitalNumber(board, id)}`, `${macro} is ${id}`);
  }
  for (const pin of board.pins.filter((p) => p.spi))
    check(`${pin.spi!.toUpperCase()} == ${digitalNumber(board, pin.id)}`, `${pin.id} is ${pin.spi}`);
  const led = board.pins.find((p) => p.builtinLed);
  if (led) check(`LED_BUILTIN == ${digitalNumber(board, led.id)}`, `LED_BUILTIN is ${led.id}`);
  return `${lines.join('\n')}\n`;
}

/** Compiles the asserts; returns the compiler's exit status and messages. */
export function compileAsserts(target: AvrTarget, source: string): { ok: boolean; output: string } {
  const dir = mkdtempSync(join(tmpdir(), 'mixwright-pins-'));
  const file = join(dir, 'pin-tables.cpp');
  writeFileSync(file, source);
  const result = spawnSync('avr-g++', [...flags(target), '-fsyntax-only', file], { encoding: 'utf8' });
  return { ok: result.status === 0, output: `${result.stdout}${result.stderr}` };
}
