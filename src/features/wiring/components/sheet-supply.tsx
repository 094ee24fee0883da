import { CAUTIONS_FOOTER, CAUTIONS_INTRO, CAUTIONS_TITLE, SAFETY_CAUTIONS } from '@shared/safety/cautions';
import { cx } from '@/components/ui/cx';
import type { PowerAdvice } from '@shared/power/power-advice';
import type { RobotConfig } from '@shared/schemas/robot-config';

const CHEMISTRY: Record<RobotConfig['power']['chemistry'], string> = {
  lipo: 'LiPo',
  'li-ion': 'Li-ion',
  lifepo4: 'LiFePO₄',
  nimh: 'NiMH',
  'lead-acid': 'lead-acid',
  alkaline: 'alkaline',
};

const LOGIC: Record<RobotConfig['power']['logicSupply'], string> = {
  usb: 'the board runs from USB',
  'driver-regulator': 'the board is fed from a driver’s 5 V regulator',
  'separate-regulator': 'the board is fed from a separate 5 V regulator on the battery',
  'board-vin': 'the battery feeds the board’s own supply input',
};

/** Battery, fuse, wire and logic supply from the power advice, with its notes. */
export function SheetSupply({ advice, config }: { advice: PowerAdvice; config: RobotConfig }) {
  const power = config.power;
  const b = advice.battery;
  const lines = [
    `Battery: ${power.cells} × ${CHEMISTRY[power.chemistry]}, ${power.capacityMah} mAh — ${b.nominalVolts} V nominal, ${b.fullVolts} V full, ${b.emptyVolts} V empty.`,
    `Fuse in the battery’s positive lead: ${advice.fuseA === null ? 'above the largest blade fuse; see the Safety section' : `${advice.fuseA} A`} (motors running hard draw about ${Math.round(advice.runningA * 10) / 10} A; all stalled ${Math.round(advice.stallTotalA * 10) / 10} A).`,
    `Battery and motor wires: ${advice.wire ? `AWG ${advice.wire.awg} (${advice.wire.mm2} mm²) or thicker` : 'thicker than the table covers; see the Safety section'}.`,
    `Logic supply: ${LOGIC[power.logicSupply]}.`,
  ];
  return (
    <section aria-labelledby="sheet-supply">
      <h2 id="sheet-supply" className="mb-1 text-[15px] font-bold">
        Supply
      </h2>
      <ul className="space-y-0.5 text-[12.5px] leading-snug">
        {lines.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
      <ul className="mt-1 list-disc space-y-0.5 pl-4 text-[12px] leading-snug text-ink-soft">
        {advice.notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </section>
  );
}

/** The safety cautions, always on the sheet; across the page (two columns of items) or in a column. */
export function SheetCautions({ wide = false }: { wide?: boolean }) {
  return (
    <section aria-labelledby="sheet-cautions-title" className="rounded border border-ink px-3 py-2">
      <h2 id="sheet-cautions-title" className="text-sm font-bold">
        ⚠ {CAUTIONS_TITLE}
      </h2>
      <p className="text-[12.5px] text-ink-soft">{CAUTIONS_INTRO}</p>
      <ul className={cx('mt-1 list-disc pl-4 text-[12.5px] leading-snug', wide && 'columns-2 gap-8')}>
        {SAFETY_CAUTIONS.map((c) => (
          <li key={c} className="break-inside-avoid">
            {c}
          </li>
        ))}
      </ul>
      <p className="mt-1 text-[11.5px] text-ink-muted">{CAUTIONS_FOOTER}</p>
    </section>
  );
}
