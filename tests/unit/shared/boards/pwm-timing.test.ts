import { describe, expect, it } from 'vitest';
import { findPin, getBoard } from '@shared/boards/boards';
import { ledcResolutionBits, pwmSettingForPin, rp2040PwmSetting } from '@shared/boards/pwm-timing';

const setting = (board: Parameters<typeof getBoard>[0], pin: string, hz: number | null, ceiling?: number) => {
  const b = getBoard(board);
  return pwmSettingForPin(b, findPin(b, pin)!, hz, ceiling)!;
};

describe('PWM settings per pin', () => {
  it('keeps the core default of 490.2 Hz when no frequency is asked for', () => {
    expect(setting('uno', 'D9', null)).toMatchObject({
      exact: true,
      steps: 255,
      avr: { prescaler: 64, mode: 'phase-correct' },
    });
    expect(setting('uno', 'D9', null).actualHz).toBeCloseTo(490.196, 3);
  });

  it('runs a 16-bit timer at exactly 20 kHz with TOP = 400 (16 MHz / (2 × 1 × 400))', () => {
    const s = setting('uno', 'D10', 20000);
    expect(s.avr).toEqual({ timer: 1, mode: 'phase-correct', prescaler: 1, top: 400, topRegister: 'ICR' });
    expect(s.actualHz).toBe(20000);
    expect(s.steps).toBe(400);
  });

  it('needs a larger prescaler for a low frequency on a 16-bit timer', () => {
    // 16 MHz / (2 × 8 × 20000) = 50 Hz: TOP 160000 overflows at prescaler 1.
    const s = setting('mega2560', 'D44', 50);
    expect(s.avr).toMatchObject({ prescaler: 8, top: 20000 });
    expect(s.actualHz).toBe(50);
  });

  it('gives timer 2 its nearest step, 31.37 kHz (16 MHz / 1 / 510), for a 20 kHz request', () => {
    const s = setting('uno', 'D3', 20000);
    expect(s.actualHz).toBeCloseTo(31372.5, 1);
    expect(s.exact).toBe(false);
  });

  it('stays under a driver ceiling on timer 2, falling to 7.8 kHz (16 MHz / 8 / 256)', () => {
    const s = setting('uno', 'D11', 20000, 25000);
    expect(s.actualHz).toBeCloseTo(7812.5, 1);
    expect(s.avr).toMatchObject({ mode: 'fast', prescaler: 8 });
  });

  it('never changes timer 0, which runs millis()', () => {
    const s = setting('uno', 'D5', 20000);
    expect(s.changeable).toBe(false);
    expect(s.actualHz).toBeCloseTo(976.5625, 4);
    expect(s.exact).toBe(false);
  });

  it('gives ESP32 LEDC 11 bits at 20 kHz and 13 bits at 5 kHz', () => {
    // floor(log2(80 MHz / 20 kHz)) = floor(11.97) = 11; floor(log2(16000)) = 13 (REFERENCES §3).
    expect(ledcResolutionBits(80e6, 20000, 20)).toBe(11);
    expect(ledcResolutionBits(80e6, 5000, 20)).toBe(13);
    expect(ledcResolutionBits(80e6, 50, 20)).toBe(20);
    expect(setting('esp32-devkitc', 'GPIO25', 20000)).toMatchObject({ ledc: { bits: 11 }, steps: 2048 });
  });

  it('divides the RP2040 clock into a slice wrap for 20 kHz', () => {
    // f = clk / (div · (wrap + 1)): 133 MHz / 20 kHz = 6650 → wrap 6649 with divider 1.
    expect(rp2040PwmSetting(133e6, 20000)).toEqual({ divider: 1, wrap: 6649, actualHz: 20000 });
    const low = rp2040PwmSetting(133e6, 50);
    expect(low.divider).toBe(41);
    expect(Math.abs(low.actualHz - 50) / 50).toBeLessThan(0.001);
  });

  it('has no setting for a pin without PWM', () => {
    const uno = getBoard('uno');
    expect(pwmSettingForPin(uno, findPin(uno, 'D4')!, 20000)).toBeNull();
  });
});
