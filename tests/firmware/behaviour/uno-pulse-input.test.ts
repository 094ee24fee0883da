import { beforeAll, describe, expect, it } from 'vitest';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { cyclesPerMs, simulate, type SimResult } from '../sim/simavr';
import { ICR1L, TCCR1B, unoPort, unoRegisters } from '../helpers/avr-registers';
import { signedUnoDuty } from '../helpers/motor-duty';
import { buildForSimulator, engineDuties, engineDutyRange } from '../helpers/sim-firmware';
import { ppmFrames, rcFrames, Timeline } from '../helpers/timeline';
import { unoWiredConfig } from '../helpers/uno-configs';

// Pulse inputs on a simulated Uno: a PPM sum signal on an external-interrupt pin and servo
// pulses on pin-change-interrupt pins, with the serial port free for health lines.

// Edges are timed with micros() (4 µs steps, Arduino reference for micros() on 16 MHz boards)
// inside an interrupt whose start can wait for another handler already running (the core's
// timer 0 overflow and serial transmit handlers, a few µs each at 16 MHz). Each edge may so be late by up to 4 + 10 µs, and a width, the difference of two
// edges, off by up to 14 µs either way — 2.8 % of the 500 µs half travel. The firmware must drive
// like the engine for some widths within that error, give or take one PWM step of rounding.
const PULSE_ERROR_US = 14;

function expectWithinPulseError(actual: number[], range: { low: number[]; high: number[] }): void {
  actual.forEach((d, i) => {
    expect(d).toBeGreaterThanOrEqual(range.low[i] - 1);
    expect(d).toBeLessThanOrEqual(range.high[i] + 1);
  });
}

const noArming = (c: RobotConfig) => {
  c.controls.armingSwitch.channel = null;
  c.controls.channels = c.controls.channels.filter((ch) => ch.number !== 6);
  c.safety.armingRequired = false;
  c.safety.rampPerSecond = 100;
  c.firmware.diagnosticsIntervalMs = 250;
};

function duties(config: RobotConfig, result: SimResult, tag: string): number[] {
  const dump = result.dumps.find((d) => d.tag === tag)!;
  return config.motors.map((_, i) => signedUnoDuty(config, i, dump.regs));
}

const portOf = (config: RobotConfig, role: string) => unoPort(config.wiring.inputPins[role].pin!.replace(/^D/, ''));

describe('a differential robot fed a PPM sum signal', () => {
  let config: RobotConfig;
  let result: SimResult;
  // Channels 1..8; the robot reads 2 (forward), 4 (yaw) and 5 (rate switch).
  const centred = [1500, 1500, 1500, 1500, 1000, 1500, 1500, 1500];
  const moved = [1500, 1750, 1500, 1350, 2000, 1500, 1500, 1500];
  const raw = (w: number[]) => ({ 1: w[0], 2: w[1], 4: w[3], 5: w[4] });

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ppm', 'pwm-in1-in2-stby', noArming);
    const pin = portOf(config, 'ppm');
    const t = new Timeline('ibus');
    ppmFrames(t, pin, 50, 400, centred);
    // Ten frames with a 400 µs channel: out of range, so bad frames.
    ppmFrames(
      t,
      pin,
      400,
      625,
      centred.map((w, i) => (i === 6 ? 400 : w)),
    );
    ppmFrames(t, pin, 625, 2600, moved);
    t.dump(2590, 'moved');
    result = await simulate((await buildForSimulator(config, 1)).elfPath, {
      mcu: 'atmega328p',
      limitCycles: 3200 * cyclesPerMs,
      registers: unoRegisters(),
      events: [...t.events, { kind: 'dump', cycle: 2890 * cyclesPerMs, tag: 'signal-gone' }],
    });
  });

  it("decodes the sum signal and drives at the engine's duties", () => {
    expect(engineDuties(config, raw(moved)).duties.some((d) => d !== 0)).toBe(true);
    expectWithinPulseError(duties(config, result, 'moved'), engineDutyRange(config, raw(moved), PULSE_ERROR_US));
  });

  it('stops when the signal disappears', () => {
    expect(duties(config, result, 'signal-gone')).toEqual([0, 0]);
  });

  it('reports about 44 good frames a second, the bad frames and then the failsafe in its health lines', () => {
    const lines = result.uart
      .toString('latin1')
      .split('\r\n')
      .filter((l) => l.startsWith('health '));
    const rates = lines.map((l) => Number(/good=(\d+)\/s/.exec(l)![1]));
    // One frame every 22.5 ms is 44.4 frames a second.
    expect(Math.max(...rates)).toBeGreaterThanOrEqual(43);
    expect(Math.max(...rates)).toBeLessThanOrEqual(45);
    expect(lines[lines.length - 1]).toMatch(/ bad=10 .* failsafes=1 state=waiting for=input/);
  });
});

describe('a differential robot fed servo pulses, one wire per channel', () => {
  let config: RobotConfig;
  let result: SimResult;
  const channels = [2, 4, 5];
  const centred = [1500, 1500, 1000];
  const moved = [1300, 1800, 2000];

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'rc-pwm', 'pwm-in1-in2-stby', noArming);
    const pins = channels.map((n) => portOf(config, `ch${n}`));
    const t = new Timeline('ibus');
    rcFrames(t, pins, 50, 400, centred);
    rcFrames(t, pins, 400, 900, moved);
    t.dump(890, 'moved');
    // Then only channel 2 keeps pulsing: the others have gone quiet.
    rcFrames(t, pins.slice(0, 1), 900, 1300, moved);
    t.dump(1290, 'channels-missing');
    result = await simulate((await buildForSimulator(config, 1)).elfPath, {
      mcu: 'atmega328p',
      limitCycles: 1300 * cyclesPerMs,
      registers: unoRegisters(),
      events: t.events,
    });
  });

  it("times each channel's pulses and drives at the engine's duties", () => {
    const range = engineDutyRange(config, { 2: moved[0], 4: moved[1], 5: moved[2] }, PULSE_ERROR_US);
    expect(range.high.some((d) => d !== 0)).toBe(true);
    expectWithinPulseError(duties(config, result, 'moved'), range);
  });

  it('stops when some channels stop pulsing while another goes on', () => {
    expect(duties(config, result, 'channels-missing')).toEqual([0, 0]);
  });
});

describe('serial commands when the serial port is free', () => {
  let config: RobotConfig;
  let result: SimResult;
  const text = (s: string) => [...Buffer.from(s, 'latin1')];

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ppm', 'pwm-in1-in2-stby', noArming);
    config.firmware.serialDiagnostics = false;
    const t = new Timeline('ibus');
    t.events.push({ kind: 'uart', cycle: 100 * cyclesPerMs, bytes: text('about\n') });
    t.events.push({ kind: 'uart', cycle: 150 * cyclesPerMs, bytes: text('health\n') });
    t.events.push({ kind: 'uart', cycle: 200 * cyclesPerMs, bytes: text('bench\n') });
    t.dump(600, 'bench-running');
    t.events.push({ kind: 'uart', cycle: 700 * cyclesPerMs, bytes: text('x') });
    t.dump(750, 'bench-stopped');
    result = await simulate((await buildForSimulator(config, 4)).elfPath, {
      mcu: 'atmega328p',
      limitCycles: 800 * cyclesPerMs,
      registers: unoRegisters(),
      events: t.events,
    });
  });

  it('prints the boot line again for "about" and a health line for "health"', () => {
    const lines = result.uart.toString('latin1').split('\r\n');
    expect(lines.filter((l) => l.startsWith('boot robot=') && l.includes('revision=4'))).toHaveLength(2);
    expect(lines.filter((l) => l.startsWith('health good='))).toHaveLength(1);
  });

  it('runs the bench test on "bench" and stops it on the next key', () => {
    const duty = Math.round(config.firmware.benchTestDuty * 255);
    const running = duties(config, result, 'bench-running');
    expect(Math.abs(running[0] - duty)).toBeLessThanOrEqual(1);
    expect(running[1]).toBe(0);
    expect(duties(config, result, 'bench-stopped')).toEqual([0, 0]);
    expect(result.uart.toString('latin1')).toContain('bench motor 1/2 "Left" forward\r\nbench stopped');
  });
});

describe('a chosen PWM frequency on the Uno', () => {
  let config: RobotConfig;
  let result: SimResult;
  const moved = [1500, 1750, 1500, 1350, 2000, 1500, 1500, 1500];

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ppm', 'pwm-in1-in2-stby', (c) => {
      noArming(c);
      c.wiring.drivers[0].pwmFrequencyHz = 20_000;
    });
    const t = new Timeline('ibus');
    ppmFrames(t, portOf(config, 'ppm'), 50, 400, [1500, 1500, 1500, 1500, 1000, 1500, 1500, 1500]);
    ppmFrames(t, portOf(config, 'ppm'), 400, 800, moved);
    t.dump(790, 'moved');
    result = await simulate((await buildForSimulator(config, 1)).elfPath, {
      mcu: 'atmega328p',
      limitCycles: 800 * cyclesPerMs,
      registers: unoRegisters(),
      events: t.events,
    });
  });

  it('runs timer 1 in phase-correct mode with ICR1 = 400 at clock / 1: 16 MHz / (2 × 400) = 20 kHz', () => {
    const regs = result.dumps[0].regs;
    expect(regs[ICR1L] | (regs[ICR1L + 1] << 8)).toBe(400);
    expect(regs[TCCR1B] & 0x1f).toBe(0x10 | 0x01);
  });

  it("scales the duties to that TOP and still matches the engine's", () => {
    const range = engineDutyRange(config, { 1: moved[0], 2: moved[1], 4: moved[3], 5: moved[4] }, PULSE_ERROR_US);
    expectWithinPulseError(duties(config, result, 'moved'), range);
  });
});
