import { beforeAll, describe, expect, it } from 'vitest';
import { compileAvrSketch } from '@server/features/firmware/toolchain/avr-compile';
import { testDir } from '../helpers/temp-dirs';
import { cyclesPerMs, simulate, type SimResult } from './simavr';

const PROBE = new URL('../fixtures/sim_probe', import.meta.url).pathname;
// ATmega328P datasheet, register summary: OCR1AL 0x88, OCR2A 0xB3, GPIOR0 0x3E (data space).
const OCR1AL = 0x88;
const OCR2A = 0xb3;
const GPIOR0 = 0x3e;

describe('the simavr runner', () => {
  let result: SimResult;

  beforeAll(async () => {
    const outDir = await testDir('probe-');
    const build = await compileAvrSketch(PROBE, 'uno', { outDir });
    if (!build.ok) throw new Error(build.messages);
    result = await simulate(build.elfPath!, {
      mcu: 'atmega328p',
      limitCycles: 200 * cyclesPerMs,
      registers: [OCR1AL, OCR2A],
      markAddress: GPIOR0,
      events: [
        { kind: 'uart', cycle: 5 * cyclesPerMs, bytes: [0x41, 0x42] },
        { kind: 'pin', port: 'D', bit: 4, cycle: 10 * cyclesPerMs, level: 1 },
        { kind: 'pin', port: 'D', bit: 4, cycle: 11 * cyclesPerMs, level: 0 },
        { kind: 'dump', cycle: 20 * cyclesPerMs, tag: 'duties' },
      ],
    });
  });

  it('captures UART output raw and delivers pushed bytes to the receiver', () => {
    expect(result.uart.toString('latin1')).toBe('probe\r\nBCchanges=2\r\n');
  });

  it('stops at the stop marker, after about 50 simulated milliseconds', () => {
    expect(result.reason).toBe('marker');
    expect(result.cycles / cyclesPerMs).toBeGreaterThanOrEqual(50);
    expect(result.cycles / cyclesPerMs).toBeLessThan(55);
  });

  it('reads the compare registers that analogWrite set', () => {
    expect(result.dumps[0].regs[OCR1AL]).toBe(77);
    expect(result.dumps[0].regs[OCR2A]).toBe(33);
  });

  it('measures a section of exactly 1000 delay cycles as 1000 cycles plus the marker store', () => {
    const start = result.marks.find(([, v]) => v === 1)!;
    const end = result.marks.find(([, v]) => v === 2)!;
    expect(end[0] - start[0]).toBeGreaterThanOrEqual(1000);
    expect(end[0] - start[0]).toBeLessThanOrEqual(1003);
  });
});
