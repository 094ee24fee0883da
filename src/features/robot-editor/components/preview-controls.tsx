import type { RobotConfig } from '@shared/schemas/robot-config';

export interface PreviewControlsProps {
  rampOn: boolean;
  onRampChange: (on: boolean) => void;
  rampPerSecond: number;
  rateSwitch: Pick<RobotConfig['controls']['rateSwitch'], 'channel' | 'rates'>;
  ratePosition: number;
  onRatePositionChange: (position: number) => void;
  onReset: () => void;
}

// One name per position; the number of positions is the number of rates.
const POSITION_NAMES: Record<number, readonly string[]> = { 2: ['low', 'high'], 3: ['low', 'middle', 'high'] };

/** The preview's own settings: ramp on or off, the rate switch position, and a reset. */
export function PreviewControls(props: PreviewControlsProps) {
  const { rateSwitch } = props;
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      <label className="inline-flex items-center gap-1.5">
        <input
          type="checkbox"
          checked={props.rampOn}
          onChange={(e) => props.onRampChange(e.target.checked)}
          className="accent-[var(--color-accent)]"
        />
        Ramp limit ({props.rampPerSecond} full scale/s)
      </label>
      {rateSwitch.channel !== null && (
        <label className="inline-flex items-center gap-1.5">
          Rate switch
          <select
            value={props.ratePosition}
            onChange={(e) => props.onRatePositionChange(Number(e.target.value))}
            className="rounded border border-rule-strong bg-paper-raised px-1.5 py-0.5"
          >
            {rateSwitch.rates.map((rate, i) => (
              <option key={i} value={i}>
                {`${POSITION_NAMES[rateSwitch.rates.length]?.[i] ?? `position ${i + 1}`} (${Math.round(rate * 100)} %)`}
              </option>
            ))}
          </select>
        </label>
      )}
      <button
        type="button"
        onClick={props.onReset}
        className="rounded border border-accent px-2.5 py-0.5 text-accent-strong hover:bg-accent-soft"
      >
        Reset position
      </button>
    </div>
  );
}
