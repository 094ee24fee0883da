import { useId, useMemo, useState } from 'react';
import {
  computeMixing,
  forwardKinematics,
  mixSticks,
  whatIfReversed,
  type MixingInput,
} from '@shared/kinematics/mixing';
import { STICK_AXES, type StickAxis } from '@shared/schemas/ids';
import { ChassisDrawing } from './chassis-drawing';

export interface WhatIfReversedPanelProps {
  /** The wheels and motors (a RobotConfig will do). */
  config: MixingInput;
  /** Motor shown reversed at first (uncontrolled). */
  defaultMotor?: string | null;
  /** Controlled: the motor shown reversed, and the change handler. */
  motor?: string | null;
  onMotorChange?: (motor: string | null) => void;
  className?: string;
}

const AXIS_LABEL: Record<StickAxis, string> = { forward: 'Forward stick', strafe: 'Strafe stick', yaw: 'Yaw stick' };

/**
 * "What if this motor turned the other way": a toggle per motor, the engine's sentences for
 * each full stick, and the drawing with every wheel's command and the motion that results
 * (solid) over the motion that was meant (dashed).
 */
export function WhatIfReversedPanel({
  config,
  defaultMotor = null,
  motor,
  onMotorChange,
  className,
}: WhatIfReversedPanelProps) {
  const id = useId();
  const [ownMotor, setOwnMotor] = useState<string | null>(defaultMotor);
  const chosen = motor !== undefined ? motor : ownMotor;
  const choose = (next: string | null) => {
    if (motor === undefined) setOwnMotor(next);
    onMotorChange?.(next);
  };
  const mixing = useMemo(() => computeMixing(config), [config]);
  const usable = STICK_AXES.filter((_, k) => mixing.matrix.some((row) => row[k] !== 0));
  const [axis, setAxis] = useState<StickAxis>(usable[0] ?? 'forward');
  const shownAxis = usable.includes(axis) ? axis : (usable[0] ?? 'forward');
  const report = useMemo(
    () => (chosen && mixing.motors.includes(chosen) ? whatIfReversed(config, chosen) : null),
    [config, chosen, mixing],
  );

  const unit = { forward: 0, strafe: 0, yaw: 0, [shownAxis]: 1 };
  const commands = mixSticks(mixing, unit);
  const index = chosen ? mixing.motors.indexOf(chosen) : -1;
  if (index >= 0) commands[index] = -commands[index];
  const result = report?.cases.find((c) => c.axis === shownAxis)?.result ?? forwardKinematics(mixing, commands);
  const byMotor = Object.fromEntries(mixing.motors.map((name, i) => [name, commands[i]]));

  return (
    <div className={`grid gap-4 font-sans text-ink md:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)] ${className ?? ''}`}>
      <div className="space-y-4">
        <fieldset>
          <legend className="mb-2 text-sm font-semibold">Reverse one motor</legend>
          <div className="flex flex-wrap gap-2">
            {mixing.motors.map((name) => (
              <button
                key={name}
                type="button"
                aria-pressed={chosen === name}
                onClick={() => choose(chosen === name ? null : name)}
                className={`rounded border px-2.5 py-1 text-sm transition-colors ${
                  chosen === name
                    ? 'border-warn-strong bg-warn-soft text-warn-strong'
                    : 'border-rule-strong bg-paper-raised text-ink hover:border-accent'
                }`}
              >
                <span aria-hidden="true" className="mr-1 font-mono">
                  {chosen === name ? '⇄' : '→'}
                </span>
                {name}
              </button>
            ))}
          </div>
        </fieldset>
        <fieldset>
          <legend className="mb-2 text-sm font-semibold">Stick shown in the drawing</legend>
          <div className="flex flex-wrap gap-3 text-sm">
            {STICK_AXES.map((a) => (
              <label
                key={a}
                className={`inline-flex items-center gap-1.5 ${usable.includes(a) ? '' : 'text-ink-faint'}`}
              >
                <input
                  type="radio"
                  name={`${id}-axis`}
                  value={a}
                  checked={shownAxis === a}
                  disabled={!usable.includes(a)}
                  onChange={() => setAxis(a)}
                  className="accent-[var(--color-accent)]"
                />
                {AXIS_LABEL[a]}
              </label>
            ))}
          </div>
        </fieldset>
        <div aria-live="polite" className="space-y-2 text-sm">
          {report ? (
            <>
              <p className="font-semibold">
                {report.cases.some((c) => c.changed) ? `If ${report.motor} turned the other way:` : report.summary}
              </p>
              <ul className="space-y-1.5">
                {report.cases.map((c) => (
                  <li
                    key={c.axis}
                    className={`border-l-2 pl-2 ${c.changed ? 'border-warn text-ink' : 'border-rule text-ink-muted'}`}
                  >
                    {c.sentence}
                  </li>
                ))}
              </ul>
            </>
          ) : (
            <p className="text-ink-muted">
              Pick a motor to see what the robot would do if that motor turned the other way.
            </p>
          )}
        </div>
      </div>
      <ChassisDrawing
        className="max-w-[560px]"
        wheels={config.chassis.wheels}
        title={
          chosen
            ? `${AXIS_LABEL[shownAxis]} pushed fully with ${chosen} reversed`
            : `${AXIS_LABEL[shownAxis]} pushed fully`
        }
        motorCommands={byMotor}
        motion={chosen ? result.sticks : null}
        intendedMotion={unit}
        highlightMotor={chosen}
      />
    </div>
  );
}
