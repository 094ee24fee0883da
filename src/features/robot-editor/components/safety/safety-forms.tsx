import { Panel } from '@/components/ui/panel';
import { summarizeBattery } from '@shared/power/battery';
import { DraftCheckbox, DraftNumberField, DraftSelectField } from '../fields/draft-fields';
import { useDraftFields } from '../fields/draft-fields-context';

const CHEMISTRY = [
  { value: 'lipo', label: 'LiPo (lithium polymer)' },
  { value: 'li-ion', label: 'Li-ion (18650 cells)' },
  { value: 'lifepo4', label: 'LiFePO4' },
  { value: 'nimh', label: 'NiMH' },
  { value: 'lead-acid', label: 'Lead-acid' },
  { value: 'alkaline', label: 'Alkaline (not rechargeable)' },
];

// How builders name packs of each chemistry, so the cell count is easy to read off the label.
const CELLS_HINT: Record<string, string> = {
  lipo: 'A 2S pack has 2',
  'li-ion': 'A 2S pack has 2',
  lifepo4: 'A 2S pack has 2',
  nimh: 'A 6 V pack has 5',
  'lead-acid': 'A 6 V battery has 3, a 12 V one 6',
  alkaline: 'Four AA cells in a holder are 4',
};

const LOGIC_SUPPLY = [
  { value: 'separate-regulator', label: 'A separate 5 V regulator from the battery' },
  { value: 'driver-regulator', label: 'A motor driver’s 5 V regulator' },
  { value: 'board-vin', label: 'Battery straight to the board’s supply input' },
  { value: 'usb', label: 'USB cable' },
];

const seconds = (ms: number) => (Number.isFinite(ms) ? `${(ms / 1000).toFixed(2)} s` : '');

/** Failsafe, ramp, output limit, arming and start-up: what keeps the motors from surprising anyone. */
export function MotorSafetyForm() {
  const { config } = useDraftFields();
  const s = config.safety;
  const rampHint =
    Number.isFinite(s.rampPerSecond) && s.rampPerSecond > 0
      ? `Standstill to full in ${(1 / s.rampPerSecond).toFixed(2)} s`
      : 'Full scale per second';
  return (
    <Panel
      title="Motor safety"
      titleId="motor-safety-title"
      description="The firmware enforces these whatever the sticks say."
    >
      <div className="grid grid-cols-[repeat(auto-fill,minmax(14rem,1fr))] gap-x-5">
        <DraftNumberField
          path={['safety', 'failsafeTimeoutMs']}
          label="Failsafe after"
          unit="ms"
          hint={`Motors stop ${seconds(s.failsafeTimeoutMs)} after the last good frame`}
        />
        <DraftNumberField path={['safety', 'rampPerSecond']} label="Ramp limit" unit="full scale/s" hint={rampHint} />
        <DraftNumberField
          path={['safety', 'outputLimitPercent']}
          label="Output limit"
          unit="%"
          hint="Highest duty any motor gets"
        />
        <DraftNumberField
          path={['safety', 'reverseDwellMs']}
          label="Reverse dwell"
          unit="ms"
          hint="Pause at stop before a motor reverses"
        />
        <DraftNumberField
          path={['safety', 'startupValidFrames']}
          label="Good frames before start"
          hint="After power-on or a failsafe"
        />
        <DraftNumberField
          path={['safety', 'centreTolerance']}
          label="Centre tolerance"
          unit="%"
          scale={100}
          hint="Sticks this near centre count as centred"
        />
      </div>
      <DraftCheckbox
        path={['safety', 'armingRequired']}
        label="Arming required"
        hint="The motors stay off until the arming switch is on (set its channel in Controls); after a failsafe the sticks must be centred again."
      />
    </Panel>
  );
}

/** The battery and how the board is fed. */
export function PowerForm() {
  const { config, errors } = useDraftFields();
  const valid = !Object.keys(errors).some((k) => k.startsWith('power.'));
  const battery = valid ? summarizeBattery(config.power) : null;
  return (
    <Panel title="Battery and logic supply" titleId="power-title">
      <div className="grid grid-cols-[repeat(auto-fill,minmax(12rem,1fr))] gap-x-5">
        <DraftSelectField path={['power', 'chemistry']} label="Chemistry" options={CHEMISTRY} width="w-full" />
        <DraftNumberField
          path={['power', 'cells']}
          label="Cells in series"
          hint={CELLS_HINT[config.power.chemistry]}
          width="w-16"
        />
        <DraftNumberField path={['power', 'capacityMah']} label="Capacity" unit="mAh" />
        <DraftNumberField path={['power', 'dischargeC']} label="Discharge rating" unit="C" width="w-16" />
        <DraftSelectField
          path={['power', 'logicSupply']}
          label="The board is fed from"
          options={LOGIC_SUPPLY}
          width="w-full"
          className="col-span-2"
        />
      </div>
      <p className="min-h-5 text-sm text-ink-soft">
        {battery &&
          `Pack voltage ${battery.emptyVolts} V empty, ${battery.nominalVolts} V nominal, ${battery.fullVolts} V full; it should deliver at most ${Math.round(battery.maxCurrentA * 10) / 10} A (capacity × C rating).`}
      </p>
    </Panel>
  );
}
