import { beforeAll, describe, expect, it } from 'vitest';
import { DRIVE_LAYOUT_IDS, type DriveLayoutId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { formatBootLine } from '@shared/boot-line/boot-line';
import { FIRMWARE_GENERATOR_VERSION } from '@server/features/firmware/generator-version';
import { configHash } from '@server/features/firmware/model/config-hash';
import { cyclesPerMs, simulate, type SimEvent, type SimResult } from '../sim/simavr';
import { unoRegisters } from '../helpers/avr-registers';
import { ibusFrame, sbusFrame } from '../helpers/frames';
import { signedUnoDuty } from '../helpers/motor-duty';
import { seededRandom } from '../../factories/random';
import { buildForSimulator, engineDuties } from '../helpers/sim-firmware';
import { unoWiredConfig } from '../helpers/uno-configs';

// Each starter layout on a simulated 16 MHz ATmega328P (simavr), fed receiver frames on UART0:
// the PWM duties the firmware writes must match the TypeScript engine's within one step of 255.

const POSITIONS = 120;
const FRAME_MS = 7;
const FRAMES_PER_POSITION = 9;
const REVISION = 7;

type Raw = Record<number, number>;

interface Plan {
  events: SimEvent[];
  positions: Raw[];
  lastFrameMs: number;
}

/** iBUS carries µs directly; SBUS counts map 1000–2000 µs onto 172–1811 (REFERENCES §5). */
function frameFor(source: 'ibus' | 'sbus', raw: Raw): number[] {
  const channels = Array.from({ length: 16 }, (_, i) => raw[i + 1] ?? (source === 'ibus' ? 1500 : 992));
  return source === 'ibus' ? ibusFrame(channels) : sbusFrame(channels);
}

function plan(source: 'ibus' | 'sbus', random: () => number): Plan {
  const [low, centre, high] = source === 'ibus' ? [1000, 1500, 2000] : [172, 992, 1811];
  const events: SimEvent[] = [];
  let t = 50;
  const send = (raw: Raw, count: number) => {
    for (let i = 0; i < count; i++, t += FRAME_MS)
      events.push({ kind: 'uart', cycle: t * cyclesPerMs, bytes: frameFor(source, raw) });
  };
  // Start-up: centred sticks with the arming switch off, then on (the re-arm rule).
  send({ 1: centre, 2: centre, 4: centre, 5: low, 6: low }, 12);
  send({ 1: centre, 2: centre, 4: centre, 5: low, 6: high }, 12);
  const positions: Raw[] = [];
  for (let p = 0; p < POSITIONS; p++) {
    const stick = () => Math.round(low + random() * (high - low));
    const raw = { 1: stick(), 2: stick(), 4: stick(), 5: random() < 0.5 ? low : high, 6: high };
    positions.push(raw);
    send(raw, FRAMES_PER_POSITION);
    events.push({ kind: 'dump', cycle: (t - 1) * cyclesPerMs, tag: `p${p}` });
  }
  // Full forward, then silence: the failsafe must stop every motor.
  send({ 1: centre, 2: high, 4: centre, 5: high, 6: high }, FRAMES_PER_POSITION);
  const lastFrameMs = t - FRAME_MS;
  events.push({ kind: 'dump', cycle: (lastFrameMs + 200) * cyclesPerMs, tag: 'before-failsafe' });
  return { events, positions, lastFrameMs };
}

function tweak(config: RobotConfig): void {
  config.safety.rampPerSecond = 100;
  config.safety.outputLimitPercent = 90;
  config.motors.forEach((m, i) => (m.startThreshold = i % 2 === 0 ? 0.12 : 0));
  config.controls.axes.yaw.expo = 0.5;
  config.controls.axes.forward.reverse = false;
}

const cases: [DriveLayoutId, 'ibus' | 'sbus'][] = DRIVE_LAYOUT_IDS.map((layout, i) => [
  layout,
  i % 2 === 0 ? 'ibus' : 'sbus',
]);

describe.each(cases)('a %s robot on a simulated Uno fed %s frames', (layout, source) => {
  let config: RobotConfig;
  let result: SimResult;
  let schedule: Plan;
  // Frame bytes take 32 × 87 µs (iBUS) or 25 × 120 µs (SBUS) to arrive after they are pushed.
  const frameArrivalMs = source === 'ibus' ? 2.8 : 3;

  beforeAll(async () => {
    config = unoWiredConfig(layout, source, 'pwm-in1-in2-stby', tweak);
    const build = await buildForSimulator(config, REVISION);
    schedule = plan(source, seededRandom(layout.length * 7919 + source.length));
    const failsafeDeadline = schedule.lastFrameMs + frameArrivalMs + config.safety.failsafeTimeoutMs + FRAME_MS;
    result = await simulate(build.elfPath, {
      mcu: 'atmega328p',
      limitCycles: (failsafeDeadline + 5) * cyclesPerMs,
      registers: unoRegisters(),
      events: [...schedule.events, { kind: 'dump', cycle: failsafeDeadline * cyclesPerMs, tag: 'after-failsafe' }],
    });
  });

  const dutiesAt = (tag: string) => {
    const dump = result.dumps.find((d) => d.tag === tag)!;
    return config.motors.map((_, i) => signedUnoDuty(config, i, dump.regs));
  };

  it(`drives every motor at the engine's duty within one PWM step at ${POSITIONS} random stick positions`, () => {
    const misses: string[] = [];
    schedule.positions.forEach((raw, p) => {
      const expected = engineDuties(config, raw);
      expect(expected.armed).toBe(true);
      const actual = dutiesAt(`p${p}`);
      if (actual.some((a, i) => Math.abs(a - expected.duties[i]) > 1)) {
        misses.push(`${JSON.stringify(raw)}: firmware ${actual.join(' ')} engine ${expected.duties.join(' ')}`);
      }
    });
    expect(misses).toEqual([]);
  });

  it('still drives 200 ms after the last frame, and has stopped every motor within the failsafe time plus one frame', () => {
    expect(dutiesAt('before-failsafe').some((d) => d !== 0)).toBe(true);
    expect(dutiesAt('after-failsafe')).toEqual(config.motors.map(() => 0));
  });

  it('prints a boot line with the revision and the configuration hash', () => {
    const text = result.uart.toString('latin1');
    expect(text).toContain(`revision=${REVISION} hash=${configHash(config)} `);
  });

  it('prints, as its first line, exactly the boot line the Firmware section shows', () => {
    const firstLine = result.uart.toString('utf8').split(/\r?\n/)[0];
    expect(firstLine).toBe(formatBootLine(config, REVISION, FIRMWARE_GENERATOR_VERSION));
  });
});
