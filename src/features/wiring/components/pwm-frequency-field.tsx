import { formatHz } from '@shared/boards/pwm-timing';
import type { DriverPwmAdvice } from '@shared/pins/pwm-advice';
import { Button } from '@/components/ui/button';
import { pathKey } from '@shared/history/field-path';
import { fieldDomId } from '../lib/wiring-problems';
import { NumberField } from './number-field';

export interface PwmFrequencyFieldProps {
  driverIndex: number;
  value: number | null;
  advice: DriverPwmAdvice;
  canEdit: boolean;
  onChange: (hz: number | null) => void;
}

/** The driver's PWM frequency: the board's default or a set value, with the advice beside it. */
export function PwmFrequencyField({ driverIndex, value, advice, canEdit, onChange }: PwmFrequencyFieldProps) {
  const path = ['wiring', 'drivers', driverIndex, 'pwmFrequencyHz'];
  const id = fieldDomId(path);
  const field = pathKey(path);
  const name = `${id}-mode`;
  if (advice.maxHz === null) {
    return (
      <div id={id} data-field={field} className="rounded-md">
        <p className="text-sm font-semibold text-ink-soft">PWM frequency</p>
        <p className="text-sm text-ink-muted">{advice.suggestion}</p>
      </div>
    );
  }
  const suggested = advice.suggestedHz;
  const running = runningWords(advice);
  return (
    <fieldset data-field={value === null ? field : undefined} className="rounded-md">
      <legend className="text-sm font-semibold text-ink-soft">PWM frequency</legend>
      <div className="mt-1 flex flex-wrap items-end gap-x-4 gap-y-2">
        <label className="flex h-8 items-center gap-1.5 text-sm">
          <input
            type="radio"
            name={name}
            checked={value === null}
            disabled={!canEdit}
            onChange={() => onChange(null)}
            className="accent-accent"
          />
          Board default
        </label>
        <label className="flex h-8 items-center gap-1.5 text-sm">
          <input
            type="radio"
            name={name}
            checked={value !== null}
            disabled={!canEdit}
            onChange={() => onChange(suggested ?? 20_000)}
            className="accent-accent"
          />
          Set a frequency
        </label>
        {value !== null && (
          <NumberField
            id={id}
            field={field}
            label="Frequency"
            value={value}
            onCommit={(hz) => hz !== null && onChange(hz)}
            min={50}
            max={100_000}
            unit="Hz"
            integer
            disabled={!canEdit}
            className="[&>label]:sr-only"
          />
        )}
      </div>
      <div className="mt-2 rounded-md border border-rule bg-paper px-3 py-2 text-sm">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <p className="max-w-prose text-ink">{advice.suggestion}</p>
          {suggested !== null && value !== suggested && canEdit && (
            <Button size="sm" variant="secondary" onClick={() => onChange(suggested)}>
              Use {formatHz(suggested)}
            </Button>
          )}
        </div>
        {running.length > 0 && (
          <p className="mt-1.5 text-ink-muted">
            <span className="font-semibold text-ink-soft">Runs now: </span>
            {running.join('; ')}.
          </p>
        )}
        {advice.quietPins.length > 0 && (
          <p className="mt-1.5 text-ink-muted">
            <span className="font-semibold text-ink-soft">Pins that run it cleanly: </span>
            {advice.quietPins.length > 8 ? (
              `${advice.quietPins.length} PWM pins, including ${advice.quietPins
                .slice(0, 4)
                .map((q) => q.pin)
                .join(', ')}.`
            ) : (
              <span className="font-mono text-[13px]">
                {advice.quietPins.map((q) => `${q.pin} ${formatHz(q.hz)}`).join(', ')}
              </span>
            )}
          </p>
        )}
        <p className="mt-1.5 text-ink-muted">
          <span className="font-semibold text-ink-soft">Keeping the default: </span>
          {advice.defaultNote.replace(/^Left at the (board|core)’s default, /, '')}
        </p>
      </div>
    </fieldset>
  );
}

/** "GP2, GP3 at 1 kHz (133 MHz / (3 × 44333) = 1 kHz)": the PWM pins grouped by what they run at. */
export function runningWords(advice: DriverPwmAdvice): string[] {
  const groups = new Map<string, { pins: string[]; hz: number | null; formula: string | null }>();
  for (const r of advice.running) {
    if (!r.pin) continue;
    const key = `${r.actualHz}|${r.formula}`;
    const group = groups.get(key) ?? { pins: [], hz: r.actualHz, formula: r.formula };
    group.pins.push(r.pin);
    groups.set(key, group);
  }
  return [...groups.values()].map(
    (g) => `${g.pins.join(', ')} at ${g.hz === null ? 'no PWM' : formatHz(g.hz)}${g.formula ? ` (${g.formula})` : ''}`,
  );
}
