import { beforeAll, describe, expect, it } from 'vitest';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { findPin, getBoard } from '@shared/boards/boards';
import { cyclesPerMs, edgePin, simulate, type SimResult } from '../sim/simavr';
import { unoPort } from '../helpers/avr-registers';
import { buildForSimulator, engineDuties } from '../helpers/sim-firmware';
import { Timeline } from '../helpers/timeline';
import { unoWiredConfig } from '../helpers/uno-configs';

// Servo-pulse ESCs on a simulated Uno: the firmware makes the pulses itself on timer 1 (no
// Servo library in the bundle). Pulses repeat every 20 ms, 1500 µs is stop, and the width
// moves 500 µs for full command (Arduino reference, Servo.writeMicroseconds).

const CENTRED = { 1: 1500, 2: 1500, 4: 1500, 5: 1000 };
const FORWARD = { ...CENTRED, 2: 1800, 4: 1400 };

interface Pulse {
  startMs: number;
  widthUs: number;
}

function pulses(result: SimResult, pin: number): Pulse[] {
  const edges = result.edges.filter(([, p]) => p === pin);
  const found: Pulse[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    if (edges[i][2] === 1 && edges[i + 1][2] === 0) {
      found.push({
        startMs: edges[i][0] / cyclesPerMs,
        widthUs: (edges[i + 1][0] - edges[i][0]) / (cyclesPerMs / 1000),
      });
    }
  }
  return found;
}

describe('a differential robot with servo-pulse ESCs', () => {
  let config: RobotConfig;
  let result: SimResult;
  let pins: number[];

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ibus', 'servo-esc', (c) => {
      c.controls.armingSwitch.channel = null;
      c.safety.armingRequired = false;
      c.safety.rampPerSecond = 100;
    });
    const signals = config.wiring.drivers.map((d) => unoPort(findPin(getBoard('uno'), d.pins['a.signal'].pin!)!.code));
    pins = signals.map((s) => edgePin(s.port, s.bit));
    const t = new Timeline('ibus').frames(50, 400, CENTRED).frames(400, 900, FORWARD);
    const build = await buildForSimulator(config, 1);
    result = await simulate(build.elfPath, {
      mcu: 'atmega328p',
      limitCycles: 900 * cyclesPerMs,
      watch: signals,
      events: t.events,
    });
  });

  it('sends a 1500 µs (stop) pulse every 20 ms on each ESC while waiting for input', () => {
    for (const pin of pins) {
      const early = pulses(result, pin).filter((p) => p.startMs > 20 && p.startMs < 390);
      expect(early.length).toBeGreaterThanOrEqual(17);
      for (const p of early) expect(Math.abs(p.widthUs - 1500)).toBeLessThanOrEqual(5);
      for (let i = 1; i < early.length; i++)
        expect(Math.abs(early[i].startMs - early[i - 1].startMs - 20)).toBeLessThanOrEqual(0.05);
    }
  });

  it("moves each pulse from 1500 µs by the engine's command, 500 µs for full", () => {
    const duties = engineDuties(config, FORWARD).duties;
    expect(duties.every((d) => d !== 0)).toBe(true);
    pins.forEach((pin, i) => {
      const last = pulses(result, pin).at(-1)!;
      const expected = 1500 + (duties[i] * 500) / 255;
      // One PWM step is about 2 µs; the interrupt that ends a pulse adds a few µs.
      expect(Math.abs(last.widthUs - expected), `ESC ${i}: ${last.widthUs} µs vs ${expected} µs`).toBeLessThanOrEqual(
        6,
      );
    });
  });
});
