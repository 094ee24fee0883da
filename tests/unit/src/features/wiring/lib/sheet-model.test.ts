import { describe, expect, it } from 'vitest';
import { sheetDrivers, sheetExtras, sheetInput, sheetPinRows } from '@/features/wiring/lib/sheet-model';
import { unoPlan } from '../../../../../fixtures/pin-plans';
import { buildConfig, withPins } from '../../../../../fixtures/robot-config-factory';

describe('the wiring sheet’s tables', () => {
  it('puts two roles that share a pin on one row', () => {
    const config = withPins(
      buildConfig({ layout: 'quad-mecanum', board: 'mega2560', driver: 'pwm-in1-in2-stby', source: 'ppm' }),
      { 'Driver 1/stby': 'D30', 'Driver 2/stby': 'D30' },
    );
    const row = sheetPinRows(config).find((r) => r.pin.id === 'D30')!;
    expect(row.roles).toEqual(['Driver 1 Standby', 'Driver 2 Standby']);
    expect(row.note).toBe('digital out');
  });

  it('states the frequency a driver really runs at', () => {
    const config = unoPlan({ pwmFrequencyHz: 20000 });
    // ATmega328P datasheet, 16-bit timer, phase-correct PWM with ICR1 as TOP:
    // f = 16 MHz / (2 × N × TOP) = 16 MHz / (2 × 1 × 400) = 20 kHz.
    expect(sheetDrivers(config)[0].pwm).toBe('20 kHz set, runs at 20 kHz');
    expect(sheetDrivers(unoPlan())[0].pwm).toBe('board default, runs at 490.2 Hz');
  });

  it('adds the SPI bus to the transceiver’s wiring', () => {
    const config = buildConfig({ board: 'uno', source: 'nrf24' });
    const rows = sheetInput(config).rows.map((r) => [r.role, r.pin.id]);
    // Arduino SPI reference, Uno: SCK 13, MOSI 11, MISO 12.
    expect(rows.slice(-3)).toEqual([
      ['Transceiver SCK (SPI bus)', 'D13'],
      ['Transceiver MOSI (SPI bus)', 'D11'],
      ['Transceiver MISO (SPI bus)', 'D12'],
    ]);
  });

  it('notes the SBUS line settings and the inverter an ATmega needs', () => {
    const notes = sheetInput(buildConfig({ board: 'nano', source: 'sbus' })).notes;
    expect(notes[0]).toBe('100000 baud, 8E2, inverted.');
    expect(notes[1]).toMatch(/^Fit a signal inverter/);
  });

  it('shows an unset status LED and bench-test pin as no pin', () => {
    const extras = sheetExtras(buildConfig());
    expect(extras.map((e) => [e.role, e.pin.id])).toEqual([
      ['Status LED', null],
      ['Bench-test switch', null],
    ]);
  });
});
