import { describe, expect, it } from 'vitest';
import { pwmAdvice } from '@shared/pins/pwm-advice';
import { buildConfig, reparse } from '../../../fixtures/robot-config-factory';
import { assignedPlan, unoPlan } from '../../../fixtures/pin-plans';

describe('PWM frequency advice', () => {
  it('suggests 20 kHz on the Uno’s 16-bit timer pins for a PWM + direction driver', () => {
    const [advice] = pwmAdvice(buildConfig({ source: 'ppm' }));
    expect(advice.suggestedHz).toBe(20000);
    // Timer 1 (D9, D10) runs 20 kHz exactly: 16 MHz / (2 × 1 × 400). Timer 2 could only give
    // 31.4 kHz, above this driver's 20 kHz; timer 0 runs millis().
    expect(advice.quietPins.map((q) => q.pin)).toEqual(['D9', 'D10']);
    expect(advice.quietPins[0]).toEqual({ pin: 'D9', hz: 20000, formula: '16 MHz / (2 × 1 × 400) = 20 kHz' });
    expect(advice.suggestion).toBe(
      'Set 20 kHz: above hearing and within the driver’s 20 kHz; it runs cleanly on D9, D10.',
    );
  });

  it('offers timer 2 at 31.4 kHz (16 MHz / 1 / 510) for a driver that accepts it', () => {
    const [advice] = pwmAdvice(buildConfig({ source: 'ppm', driver: 'pwm-in1-in2-stby' }));
    expect(advice.quietPins.map((q) => [q.pin, Math.round(q.hz)])).toEqual([
      ['D3', 31373],
      ['D9', 20000],
      ['D10', 20000],
      ['D11', 31373],
    ]);
  });

  it('explains the audible default with its arithmetic', () => {
    const [advice] = pwmAdvice(buildConfig({ source: 'ppm' }));
    expect(advice.defaultNote).toContain('490.2 Hz (16 MHz / 64 / 510 = 490.2 Hz (phase-correct PWM))');
    expect(advice.defaultNote).toContain('976.6 Hz on timer 0');
  });

  it('reports what each PWM pin runs at now', () => {
    const [advice] = pwmAdvice(unoPlan({ pwmFrequencyHz: 20000 }, { 'Driver 1/b.pwm': 'D5' }));
    expect(advice.running.map((r) => [r.roleId, r.pin, Math.round(r.actualHz ?? 0)])).toEqual([
      ['a.pwm', 'D9', 20000],
      ['b.pwm', 'D5', 977],
    ]);
  });

  it('leaves out pins on the servo-pulse timer and pins of other drivers', () => {
    const config = reparse(buildConfig({ source: 'ppm' }), (c) => {
      c.wiring.drivers = [
        { ...c.wiring.drivers[0], name: 'Left', motors: ['Left'] },
        { ...c.wiring.drivers[0], name: 'Right', kind: 'servo-esc', motors: ['Right'] },
      ];
    });
    expect(pwmAdvice(config)[0].quietPins).toEqual([]);
    expect(pwmAdvice(config)[0].suggestion).toContain('no free pin on the Uno can run it');
  });

  it('has nothing to set for an ESC', () => {
    const [advice] = pwmAdvice(buildConfig({ driver: 'servo-esc', source: 'ppm' }));
    expect(advice.suggestedHz).toBeNull();
    expect(advice.quietPins).toEqual([]);
  });

  it('keeps other drivers’ timers out unless they run the same frequency', () => {
    const plan = assignedPlan({ layout: 'quad-mecanum', board: 'mega2560', driver: 'dual-pwm', source: 'ppm' });
    const advice = pwmAdvice(plan);
    const othersPins = new Set(plan.wiring.drivers.slice(1).flatMap((d) => Object.values(d.pins).map((a) => a.pin)));
    for (const q of advice[0].quietPins) expect(othersPins.has(q.pin)).toBe(false);
  });

  it('offers every output GPIO of the ESP32 at 20 kHz except strapping, flash and USB serial pins', () => {
    const [advice] = pwmAdvice(buildConfig({ board: 'esp32-devkitc', source: 'ppm' }));
    expect(advice.quietPins.map((q) => Number(q.pin.slice(4)))).toEqual([
      4, 13, 14, 16, 17, 18, 19, 21, 22, 23, 25, 26, 27, 32, 33,
    ]);
    expect(advice.quietPins.find((q) => q.pin === 'GPIO25')).toEqual({
      pin: 'GPIO25',
      hz: 20000,
      formula: 'floor(log2(80 MHz / 20 kHz)) = 11 bits',
    });
  });
});
