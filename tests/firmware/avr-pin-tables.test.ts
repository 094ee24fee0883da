import { describe, expect, it } from 'vitest';
import { getBoard } from '@shared/boards/boards';
import type { BoardProfile } from '@shared/boards/board-types';
import { AVR_TARGETS, compileAsserts, coreTimerTable, pinTableAsserts } from './avr-pin-asserts';

// Our AVR pin tables against the Arduino AVR core's variants/*/pins_arduino.h, compiled with
// avr-g++ (FIRMWARE.md): PWM, timer outputs, external and pin-change interrupts, SPI, I²C,
// the built-in LED and the analog pin numbers.

describe.each(['uno', 'nano', 'mega2560'] as const)('the %s profile', (id) => {
  const target = AVR_TARGETS[id];

  it('agrees with the core pins_arduino.h on every pin', () => {
    const result = compileAsserts(target, pinTableAsserts(getBoard(id), coreTimerTable(target)));
    expect(result.output).not.toMatch(/error/);
    expect(result.ok).toBe(true);
  });
});

describe('the pin-table check', () => {
  it('fails when a table claims PWM on a pin the core has none on', () => {
    const uno = getBoard('uno');
    const wrong: BoardProfile = {
      ...uno,
      pins: uno.pins.map((p) => (p.id === 'D4' ? { ...p, pwm: { timer: 0, channel: 'B' as const } } : p)),
    };
    const result = compileAsserts(AVR_TARGETS.uno, pinTableAsserts(wrong, coreTimerTable(AVR_TARGETS.uno)));
    expect(result.ok).toBe(false);
    expect(result.output).toContain('uno: D4 has PWM');
  });

  it('fails when a table moves an external interrupt', () => {
    const mega = getBoard('mega2560');
    const wrong: BoardProfile = {
      ...mega,
      pins: mega.pins.map((p) => (p.id === 'D18' ? { ...p, externalInterrupt: 4 } : p)),
    };
    const result = compileAsserts(AVR_TARGETS.mega2560, pinTableAsserts(wrong, coreTimerTable(AVR_TARGETS.mega2560)));
    expect(result.ok).toBe(false);
    expect(result.output).toContain('mega2560: D18 external interrupt 4');
  });

  it('reads the core timer table for the ATmega328P branch', () => {
    // variants/standard: pin 3 is TIMER2B except on the ATmega8.
    expect(
      coreTimerTable(AVR_TARGETS.uno)
        .split(',')
        .map((s) => s.trim())[3],
    ).toBe('TIMER2B');
  });
});
