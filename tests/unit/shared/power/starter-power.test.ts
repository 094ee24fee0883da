import { describe, expect, it } from 'vitest';
import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import { powerAdvice } from '@shared/power/power-advice';
import { STARTER_POWER } from '@shared/power/starter-power';
import { DRIVER_KIND_IDS } from '@shared/schemas/ids';
import { buildStarterConfig } from '@shared/starter';
import { choiceName, everyStarterChoice } from '../../../fixtures/starter-options';

describe('the motors and battery of a starter configuration', () => {
  it('raise no power problem for any layout, board, input source and driver kind', () => {
    for (const choice of everyStarterChoice()) {
      expect(
        powerAdvice(buildStarterConfig(choice)).problems.map((p) => p.code),
        choiceName(choice),
      ).toEqual([]);
    }
  });

  it.each(DRIVER_KIND_IDS)(
    'gives %s drivers motors whose stall current is within the kind’s continuous rating',
    (driver) => {
      const { continuousA } = DRIVER_KINDS[driver].ratings;
      const config = buildStarterConfig({ layout: 'quad-mecanum', driver });
      for (const motor of config.motors) {
        expect(motor).toMatchObject(STARTER_POWER[driver].motor);
        if (continuousA !== null) expect(motor.stallCurrentA).toBeLessThanOrEqual(continuousA);
      }
      expect(config.power).toMatchObject(STARTER_POWER[driver].power);
    },
  );

  it('gives the TB6612-class starter 6 V motors stalling at 1 A on a 6 V NiMH pack', () => {
    // TB6612FNG datasheet: 1.2 A average per channel; five NiMH cells at 1.2 V nominal (from memory).
    const config = buildStarterConfig({ layout: 'differential', driver: 'pwm-in1-in2-stby' });
    expect(config.motors.map((m) => [m.ratedVoltage, m.stallCurrentA])).toEqual([
      [6, 1],
      [6, 1],
    ]);
    expect(powerAdvice(config).battery.nominalVolts).toBe(6);
  });
});
