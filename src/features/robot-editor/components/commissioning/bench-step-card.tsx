import { useId } from 'react';
import { cx } from '@/components/ui/cx';
import type { BenchFinding, BenchStep } from '@shared/commissioning/commissioning';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { ChassisDrawing } from '../chassis-drawing';
import { expectedWheelMotion } from '../commissioning-diagram';

export interface BenchStepCardProps {
  config: RobotConfig;
  step: BenchStep;
  total: number;
  finding: Partial<BenchFinding>;
  onAnswer: (finding: Partial<BenchFinding>) => void;
  disabled: boolean;
}

/** One motor of the bench test: where and which way its wheels should turn, and what was seen. */
export function BenchStepCard({ config, step, total, finding, onAnswer, disabled }: BenchStepCardProps) {
  const id = useId();
  const others = config.motors.map((m) => m.name).filter((n) => n !== step.motor);
  const turned = finding.turned === undefined ? undefined : finding.turned;
  const watched = turned ?? step.motor;
  const watchedWheels = config.chassis.wheels.filter((w) => w.motor === watched);
  const where = turned === undefined || turned === step.motor ? 'expected' : turned === null ? 'nothing' : 'other';
  return (
    <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)]">
      <figure>
        <ChassisDrawing
          wheels={config.chassis.wheels}
          title={`Bench test, motor ${step.index + 1} of ${total}: the wheels of ${watched} turning forward at ${Math.round(step.duty * 100)} %`}
          motorCommands={turned === null ? {} : { [watched]: step.duty }}
          highlightMotor={turned === null ? step.motor : watched}
          width={420}
          height={380}
        />
        <figcaption className="mt-1 text-xs text-ink-muted">
          Arrows: which way the top of each wheel should move (wheels off the ground).
        </figcaption>
      </figure>
      <div className="flex flex-col gap-3 text-sm">
        <p>
          The firmware prints{' '}
          <code className="rounded bg-paper-sunken px-1.5 py-0.5 text-[0.85rem]">{step.consoleLine}</code> and runs{' '}
          <strong>{step.motor}</strong> forward at {Math.round(step.duty * 100)} % for {(step.ms / 1000).toFixed(1)} s.
        </p>
        <fieldset disabled={disabled}>
          <legend className="mb-1 font-semibold">Which wheels turned?</legend>
          <div className="flex flex-col gap-1.5">
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name={`${id}-where`}
                checked={where === 'expected' && turned !== undefined}
                onChange={() => onAnswer({ ...finding, turned: step.motor })}
                className="accent-accent"
              />
              The highlighted {step.wheels.length === 1 ? 'wheel' : 'wheels'} (
              {step.wheels.map((w) => w.name).join(', ')})
            </label>
            {others.length > 0 && (
              <label className="flex flex-wrap items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-where`}
                  checked={where === 'other'}
                  onChange={() => onAnswer({ ...finding, turned: others[0] })}
                  className="accent-accent"
                />
                The wheels of another motor:
                <select
                  aria-label="Which motor's wheels turned"
                  value={where === 'other' ? (turned as string) : ''}
                  onChange={(e) => onAnswer({ ...finding, turned: e.target.value })}
                  className="rounded border border-rule-strong bg-paper-raised px-2 py-1"
                >
                  <option value="" disabled>
                    choose…
                  </option>
                  {others.map((n) => (
                    <option key={n} value={n}>
                      {n} (
                      {config.chassis.wheels
                        .filter((w) => w.motor === n)
                        .map((w) => w.name)
                        .join(', ')}
                      )
                    </option>
                  ))}
                </select>
              </label>
            )}
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name={`${id}-where`}
                checked={where === 'nothing'}
                onChange={() => onAnswer({ motor: step.motor, turned: null, direction: 'expected' })}
                className="accent-accent"
              />
              Nothing turned
            </label>
          </div>
        </fieldset>
        {turned !== undefined && turned !== null && (
          <fieldset disabled={disabled}>
            <legend className="mb-1 font-semibold">Did they turn the way the arrows show?</legend>
            <ul className="mb-1.5 list-disc pl-5 text-ink-soft">
              {watchedWheels.map((w) => (
                <li key={w.name}>
                  {w.name}: {expectedWheelMotion(w, 1).words.replace(/, 100 %$/, '')}
                </li>
              ))}
            </ul>
            <div className="flex gap-4">
              {(['expected', 'opposite'] as const).map((d) => (
                <label
                  key={d}
                  className={cx(
                    'flex items-center gap-2',
                    d === 'opposite' && finding.direction === d && 'font-semibold text-warn-strong',
                  )}
                >
                  <input
                    type="radio"
                    name={`${id}-direction`}
                    checked={finding.direction === d}
                    onChange={() => onAnswer({ ...finding, direction: d })}
                    className="accent-accent"
                  />
                  {d === 'expected' ? 'Yes, as shown' : 'No, the other way'}
                </label>
              ))}
            </div>
          </fieldset>
        )}
        {turned === null && (
          <p className="rounded border border-error/30 bg-error-soft px-3 py-2 text-error-strong">
            A motor that does not turn at all is not fixed by the configuration: check its power, the driver’s enable or
            standby pin, and the wiring to the pins shown in Wiring.
          </p>
        )}
      </div>
    </div>
  );
}
