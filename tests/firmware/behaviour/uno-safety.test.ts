import { beforeAll, describe, expect, it } from 'vitest';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { cyclesPerMs, simulate, type SimResult } from '../sim/simavr';
import { unoRegisters } from '../helpers/avr-registers';
import { signedUnoDuty } from '../helpers/motor-duty';
import { buildForSimulator, engineDuties } from '../helpers/sim-firmware';
import { Timeline } from '../helpers/timeline';
import { unoWiredConfig } from '../helpers/uno-configs';

// The safety rules on a simulated Uno (simavr) with a differential robot fed iBUS frames:
// channel 2 forward, 4 yaw, 6 the arming switch (starter mapping), 1000/1500/2000 µs.

const CENTRED = { 1: 1500, 2: 1500, 4: 1500, 5: 1000 };
const ARMED = { 6: 2000 };
const DISARMED = { 6: 1000 };
const FORWARD = { ...CENTRED, 2: 1800 };
const REVERSE = { ...CENTRED, 2: 1200 };

async function run(config: RobotConfig, timeline: Timeline, endMs: number): Promise<SimResult> {
  const build = await buildForSimulator(config, 1);
  return simulate(build.elfPath, {
    mcu: 'atmega328p',
    limitCycles: endMs * cyclesPerMs,
    registers: unoRegisters(),
    events: timeline.events,
  });
}

/** Within one PWM step of the expected duties (the engine rounds in floating point). */
function expectNear(actual: number[], expected: number[]): void {
  expect(actual.length).toBe(expected.length);
  actual.forEach((a, i) =>
    expect(Math.abs(a - expected[i]), `motor ${i}: ${a} vs ${expected[i]}`).toBeLessThanOrEqual(1),
  );
}

function duties(config: RobotConfig, result: SimResult, tag: string): number[] {
  const dump = result.dumps.find((d) => d.tag === tag);
  if (!dump) throw new Error(`No dump ${tag}`);
  return config.motors.map((_, i) => signedUnoDuty(config, i, dump.regs));
}

describe('start-up, arming, failsafe latch and reverse dwell', () => {
  let config: RobotConfig;
  let result: SimResult;
  const stopped = () => config.motors.map(() => 0);

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ibus', 'pwm-in1-in2-stby', (c) => {
      c.safety.rampPerSecond = 100;
      c.safety.reverseDwellMs = 100;
    });
    const t = new Timeline('ibus')
      .frames(50, 300, { ...FORWARD, ...ARMED })
      .dump(295, 'deflected-at-power-on')
      .frames(300, 600, { ...CENTRED, ...ARMED })
      .dump(595, 'armed-since-power-on')
      .frames(600, 700, { ...CENTRED, ...DISARMED })
      .frames(700, 900, { ...CENTRED, ...ARMED })
      .frames(900, 1100, { ...FORWARD, ...ARMED })
      .dump(1095, 'running')
      .frames(1100, 1500, { ...FORWARD, ...ARMED }, { corrupt: true })
      .dump(1100 + 260, 'bad-checksums')
      .frames(1500, 1700, { ...FORWARD, ...ARMED })
      .dump(1695, 'back-but-deflected')
      .frames(1700, 1800, { ...CENTRED, ...ARMED })
      .dump(1795, 'centred-not-rearmed')
      .frames(1800, 1900, { ...CENTRED, ...DISARMED })
      .frames(1900, 2000, { ...CENTRED, ...ARMED })
      .frames(2000, 2200, { ...FORWARD, ...ARMED })
      .dump(2195, 'running-again')
      .frames(2200, 2500, { ...REVERSE, ...ARMED })
      .dump(2250, 'reversing')
      .dump(2495, 'reversed')
      .frames(2500, 2600, { ...REVERSE, ...DISARMED })
      .dump(2595, 'disarmed');
    result = await run(config, t, 2650);
  });

  it('keeps the motors off at power-on while the sticks are deflected', () => {
    expect(duties(config, result, 'deflected-at-power-on')).toEqual(stopped());
  });

  it('keeps them off with centred sticks until the arming switch has been off and on again', () => {
    expect(duties(config, result, 'armed-since-power-on')).toEqual(stopped());
  });

  it("drives at the engine's duties once armed, centred and then moved", () => {
    const expected = engineDuties(config, { ...FORWARD, ...ARMED }).duties;
    expect(expected.every((d) => d > 0)).toBe(true);
    expectNear(duties(config, result, 'running'), expected);
  });

  it('treats frames with bad checksums as no input and stops within the failsafe time', () => {
    expect(duties(config, result, 'bad-checksums')).toEqual(stopped());
  });

  it('stays stopped when good frames return with the sticks deflected (the failsafe latches)', () => {
    expect(duties(config, result, 'back-but-deflected')).toEqual(stopped());
  });

  it('stays stopped with centred sticks until the robot is re-armed', () => {
    expect(duties(config, result, 'centred-not-rearmed')).toEqual(stopped());
    expectNear(duties(config, result, 'running-again'), engineDuties(config, { ...FORWARD, ...ARMED }).duties);
  });

  it('holds a reversing motor stopped for the reverse dwell, then drives it the other way', () => {
    expect(duties(config, result, 'reversing')).toEqual(stopped());
    const expected = engineDuties(config, { ...REVERSE, ...ARMED }).duties;
    expect(expected.every((d) => d < 0)).toBe(true);
    expectNear(duties(config, result, 'reversed'), expected);
  });

  it('stops every motor when the arming switch goes off', () => {
    expect(duties(config, result, 'disarmed')).toEqual(stopped());
  });
});

describe('the ramp limit', () => {
  it('raises the duty by at most the configured rate (4 full scale per second)', async () => {
    const config = unoWiredConfig('differential', 'ibus', 'pwm-in1-in2-stby', (c) => {
      c.controls.armingSwitch.channel = null;
      c.safety.armingRequired = false;
    });
    const full = { ...CENTRED, 2: 2000 };
    const t = new Timeline('ibus')
      .frames(50, 300, CENTRED)
      .frames(300, 800, full)
      .dump(400, 'after-100ms')
      .dump(795, 'settled');
    const result = await run(config, t, 820);
    // 0.4 full scale after 100 ms, give or take one 10 ms control step (0.04).
    for (const duty of duties(config, result, 'after-100ms'))
      expect(Math.abs(duty - 0.4 * 255)).toBeLessThanOrEqual(0.05 * 255);
    expectNear(duties(config, result, 'settled'), engineDuties(config, full).duties);
  });
});

describe('the SBUS receiver failsafe flag', () => {
  it('stops the motors although frames keep arriving', async () => {
    const config = unoWiredConfig('differential', 'sbus', 'pwm-in1-in2-stby', (c) => {
      c.controls.armingSwitch.channel = null;
      c.safety.armingRequired = false;
    });
    const centred = { 1: 992, 2: 992, 4: 992, 5: 172 };
    const forward = { ...centred, 2: 1600 };
    const t = new Timeline('sbus')
      .frames(50, 300, centred)
      .frames(300, 500, forward)
      .dump(495, 'running')
      .frames(500, 900, forward, { flags: 0x08 })
      .dump(500 + 262, 'receiver-failsafe');
    const result = await run(config, t, 900);
    expect(duties(config, result, 'running').every((d) => d > 0)).toBe(true);
    expect(duties(config, result, 'receiver-failsafe')).toEqual([0, 0]);
  });
});

describe('the bench test started by a pin held low at power-on', () => {
  let config: RobotConfig;
  let result: SimResult;

  beforeAll(async () => {
    config = unoWiredConfig('differential', 'ibus', 'pwm-in1-in2-stby', (c) => {
      c.wiring.benchTestPin = { pin: 'A5', locked: false };
    });
    // A5 is PC5, held low through set-up (again after pinMode turns the pull-up on); no frames.
    const t = new Timeline('ibus')
      .pin(0, 'C', 5, 0)
      .pin(5, 'C', 5, 0)
      .pin(10, 'C', 5, 0)
      .pin(15, 'C', 5, 0)
      .dump(500, 'first')
      .dump(1200, 'pause')
      .dump(1900, 'second')
      .dump(2600, 'done');
    result = await run(config, t, 2900);
  });

  it('spins each motor forward in turn at the bench duty, one at a time', () => {
    const duty = Math.round(config.firmware.benchTestDuty * 255);
    expectNear(duties(config, result, 'first'), [duty, 0]);
    expect(duties(config, result, 'pause')).toEqual([0, 0]);
    expectNear(duties(config, result, 'second'), [0, duty]);
    expect(duties(config, result, 'done')).toEqual([0, 0]);
  });

  it('names each motor on the serial console', () => {
    const text = result.uart.toString('latin1');
    expect(text).toContain('bench motor 1/2 "Left" forward');
    expect(text).toContain('bench motor 2/2 "Right" forward');
    expect(text).toContain('bench done');
  });
});
