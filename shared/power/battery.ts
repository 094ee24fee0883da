import type { Power } from '../schemas/robot-config';

/**
 * Cell voltages per chemistry: empty (cut-off under load), nominal, full. LiPo 3.0–4.2 V from
 * REFERENCES §8; nominal LiPo 3.7 V and every other chemistry from memory.
 */
export const CELL_VOLTS: Record<Power['chemistry'], { empty: number; nominal: number; full: number }> = {
  lipo: { empty: 3.0, nominal: 3.7, full: 4.2 },
  'li-ion': { empty: 2.5, nominal: 3.6, full: 4.2 },
  lifepo4: { empty: 2.5, nominal: 3.2, full: 3.65 },
  nimh: { empty: 1.0, nominal: 1.2, full: 1.45 },
  'lead-acid': { empty: 1.75, nominal: 2.0, full: 2.15 },
  alkaline: { empty: 0.9, nominal: 1.5, full: 1.6 },
};

export interface BatterySummary {
  emptyVolts: number;
  nominalVolts: number;
  fullVolts: number;
  /** Capacity (Ah) × discharge rating (C): the most the pack should deliver, amperes. */
  maxCurrentA: number;
  /** The six-cell alkaline block sold as a 9 V battery. */
  isNineVoltBlock: boolean;
}

export function summarizeBattery(power: Power): BatterySummary {
  const cell = CELL_VOLTS[power.chemistry];
  const round = (v: number) => Math.round(v * 100) / 100;
  return {
    emptyVolts: round(cell.empty * power.cells),
    nominalVolts: round(cell.nominal * power.cells),
    fullVolts: round(cell.full * power.cells),
    maxCurrentA: (power.capacityMah / 1000) * power.dischargeC,
    isNineVoltBlock: power.chemistry === 'alkaline' && power.cells === 6,
  };
}
