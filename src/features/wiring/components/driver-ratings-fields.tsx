import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import type { Driver } from '@shared/schemas/robot-config';
import { fieldDomId } from '../lib/wiring-problems';
import { NumberField } from './number-field';

/** The module's current ratings as its maker prints them; empty = the kind's typical figures. */
export function DriverRatingsFields({
  driverIndex,
  driver,
  canEdit,
  onChange,
}: {
  driverIndex: number;
  driver: Driver;
  canEdit: boolean;
  onChange: (patch: Partial<Driver>) => void;
}) {
  const ratings = DRIVER_KINDS[driver.kind].ratings;
  const base = ['wiring', 'drivers', driverIndex];
  // Most sources already state the motor supply; only add it where they do not.
  const supply =
    ratings.motorVolts && !/\d\s*V\b/.test(ratings.source)
      ? `; motor supply ${ratings.motorVolts.min}–${ratings.motorVolts.max} V`
      : '';
  return (
    <div className="flex flex-wrap items-start gap-x-6 gap-y-2 border-t border-rule pt-3">
      <div className="min-w-48 flex-1">
        <p className="text-sm font-semibold text-ink-soft">Module ratings, per channel</p>
        <p className="text-[13px] text-ink-muted">
          Leave empty for the kind’s typical figures ({ratings.source}
          {supply}).
        </p>
      </div>
      <NumberField
        id={fieldDomId([...base, 'continuousCurrentA'])}
        field={`wiring.drivers.${driverIndex}.continuousCurrentA`}
        label="Continuous"
        value={driver.continuousCurrentA}
        onCommit={(v) => onChange({ continuousCurrentA: v })}
        min={0.1}
        max={500}
        unit="A"
        placeholder={ratings.continuousA === null ? '—' : String(ratings.continuousA)}
        disabled={!canEdit}
      />
      <NumberField
        id={fieldDomId([...base, 'peakCurrentA'])}
        field={`wiring.drivers.${driverIndex}.peakCurrentA`}
        label="Peak"
        value={driver.peakCurrentA}
        onCommit={(v) => onChange({ peakCurrentA: v })}
        min={0.1}
        max={1000}
        unit="A"
        placeholder={ratings.peakA === null ? '—' : String(ratings.peakA)}
        disabled={!canEdit}
      />
    </div>
  );
}
