import type { DriverKindId } from '../schemas/ids';
import type { Motor, Power } from '../schemas/robot-config';

/** The motors and battery a starter configuration gets with a driver kind. */
export interface StarterPower {
  motor: Pick<Motor, 'ratedVoltage' | 'stallCurrentA'>;
  power: Pick<Power, 'chemistry' | 'cells' | 'capacityMah' | 'dischargeC'>;
}

/*
 * A starter is a plausible small build whose numbers agree with each other, so a new robot opens
 * without power warnings; the builder then enters their own motors' and pack's figures. Each
 * driver kind gets the motor class it is usually paired with, chosen so that:
 * - the motor's stall current is within the kind's continuous rating (driver-kinds.ts, with the
 *   datasheets cited there: TB6612FNG 1.2 A average, DRV8833 1.5 A RMS, L298 2 A DC, the
 *   half-bridge and PWM + direction module classes about 10 A), so a held stall is survivable;
 * - a full pack, less the bridge's drop, stays within 125 % of the motor's rated voltage and the
 *   nominal pack within 75 % of it (power-advice.ts), and the pack stays inside the driver's
 *   motor-supply range from full down to empty;
 * - the pack's capacity × C covers every motor stalled at once.
 *
 * Motor classes, from memory (typical catalogue figures, not one product): a small 6 V metal or
 * plastic gearmotor stalls at about 1 A; a 12 V gearmotor of about 37 mm diameter at about 5 A.
 * Packs, common practice: five NiMH cells (6 V nominal) for 6 V motors; a 2S LiPo behind an
 * L298-class bridge, whose 1.8–3.2 V drop at 1 A (L298 datasheet, electrical characteristics,
 * total drop VCEsat) brings 8.4 V down to about 6 V; a 3S LiPo (11.1 V nominal) for 12 V
 * motors. NiMH AA cells of about 2000 mAh deliver about 5 C; hobby LiPo packs are sold at
 * 20–30 C (both from memory).
 */
const SMALL_GEARMOTOR = { ratedVoltage: 6, stallCurrentA: 1 } as const;
const LARGE_GEARMOTOR = { ratedVoltage: 12, stallCurrentA: 5 } as const;
const NIMH_5_CELL = { chemistry: 'nimh', cells: 5, capacityMah: 2000, dischargeC: 5 } as const;
const LIPO_2S = { chemistry: 'lipo', cells: 2, capacityMah: 2200, dischargeC: 20 } as const;
const LIPO_3S = { chemistry: 'lipo', cells: 3, capacityMah: 2200, dischargeC: 25 } as const;

export const STARTER_POWER: Record<DriverKindId, StarterPower> = {
  // Modules of about 10 A continuous drive the larger gearmotors.
  'dual-pwm': { motor: LARGE_GEARMOTOR, power: LIPO_3S },
  'pwm-dir': { motor: LARGE_GEARMOTOR, power: LIPO_3S },
  // 2S LiPo: five NiMH cells would leave 6 V motors about 3.5 V after the bridge's drop.
  'en-in1-in2': { motor: SMALL_GEARMOTOR, power: LIPO_2S },
  'pwm-in1-in2-stby': { motor: SMALL_GEARMOTOR, power: NIMH_5_CELL },
  'two-input': { motor: SMALL_GEARMOTOR, power: NIMH_5_CELL },
  // A brushed ESC's ratings are on its label; brushed ESCs for 2–3S packs are common (from memory).
  'servo-esc': { motor: LARGE_GEARMOTOR, power: LIPO_3S },
};
