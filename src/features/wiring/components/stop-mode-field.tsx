import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import type { Driver } from '@shared/schemas/robot-config';
import { fieldDomId } from '../lib/wiring-problems';

const MEANING = {
  brake: 'the motor’s leads are shorted, so it stops quickly and holds against a push',
  coast: 'the motor is let go and spins down by itself',
} as const;

/** Brake or coast when the command is zero, with what each means for this kind of driver. */
export function StopModeField({
  driverIndex,
  driver,
  canEdit,
  onChange,
}: {
  driverIndex: number;
  driver: Driver;
  canEdit: boolean;
  onChange: (mode: Driver['stopMode']) => void;
}) {
  const ways = DRIVER_KINDS[driver.kind].stopModes;
  const id = fieldDomId(['wiring', 'drivers', driverIndex, 'stopMode']);
  return (
    <fieldset id={id} data-field={`wiring.drivers.${driverIndex}.stopMode`} className="rounded-md">
      <legend className="text-sm font-semibold text-ink-soft">At zero command</legend>
      <div className="mt-1 space-y-1.5">
        {(['brake', 'coast'] as const).map((mode) => {
          const how = ways[mode];
          return (
            <label key={mode} className="flex items-start gap-2 text-sm">
              <input
                type="radio"
                name={`${id}-mode`}
                value={mode}
                checked={driver.stopMode === mode}
                disabled={!canEdit || how === null}
                onChange={() => onChange(mode)}
                className="mt-1 accent-accent"
              />
              <span>
                <span className="font-semibold text-ink">{mode === 'brake' ? 'Brake' : 'Coast'}</span>
                <span className="text-ink-muted">: {MEANING[mode]}.</span>
                <span className="block text-[13px] text-ink-muted">
                  {how === null ? 'Not possible with this kind of driver.' : `This driver: ${how}.`}
                </span>
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
