import { describe, expect, it } from 'vitest';
import { BOARDS } from '@shared/boards/boards';
import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import { pwmAdvice } from '@shared/pins/pwm-advice';
import { powerAdvice } from '@shared/power/power-advice';
import { robotProblems } from '@shared/problems/robot-problems';
import { BOARD_IDS, DRIVER_KIND_IDS } from '@shared/schemas/ids';
import { buildStarterConfig } from '@shared/starter';

// Where a figure comes from ("from memory", "common practice", "quoted") is for the code's
// comments; the builder reads the figure, at most called "typical".
const PROVENANCE = /from memory|common practice|\((quoted|seen|derived)\)/i;

function stringsIn(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(stringsIn);
  if (value && typeof value === 'object') return Object.values(value).flatMap(stringsIn);
  return [];
}

const leaks = (texts: string[]) => texts.filter((t) => PROVENANCE.test(t));

describe('text shown to builders', () => {
  it('has no source markers in the driver kinds', () => {
    expect(leaks(stringsIn(DRIVER_KINDS))).toEqual([]);
  });

  it('has no source markers in the board profiles', () => {
    expect(leaks(stringsIn(BOARDS))).toEqual([]);
  });

  it('has no source markers in the power advice, the PWM advice or the problems of any board and driver', () => {
    for (const board of BOARD_IDS)
      for (const driver of DRIVER_KIND_IDS) {
        const config = buildStarterConfig({ layout: 'quad-mecanum', board, driver, input: 'nrf24' });
        const overloaded = {
          ...config,
          motors: config.motors.map((m) => ({ ...m, stallCurrentA: 60, ratedVoltage: 3 })),
          power: { ...config.power, logicSupply: 'board-vin' as const, cells: 6 },
        };
        for (const c of [config, overloaded]) {
          const texts = [...stringsIn(powerAdvice(c)), ...stringsIn(pwmAdvice(c)), ...stringsIn(robotProblems(c))];
          expect(leaks(texts), `${board}/${driver}`).toEqual([]);
        }
      }
  });

  it('would catch a marker left in a sentence', () => {
    expect(
      leaks([
        'Runs at 1 kHz (from memory).',
        'The usual 125 % rule (common practice).',
        'A listing (quoted).',
        'Runs at about 1 kHz.',
      ]),
    ).toHaveLength(3);
  });
});
