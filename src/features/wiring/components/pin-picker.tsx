import type { PinDemand } from '@shared/pins/pin-demands';
import type { Problem } from '@shared/problems/problem';
import { cx } from '@/components/ui/cx';
import { isRoleLit, useHighlight } from '../hooks/wiring-highlight';
import type { PinChoice, PinChoices } from '../lib/pin-choices';
import { pinName } from '../lib/pin-words';
import { fieldDomId, roleFieldKey } from '../lib/wiring-problems';
import { LockToggle } from './lock-toggle';
import { ProblemLine } from './severity-icon';

export interface PinPickerProps {
  demand: PinDemand;
  /** The role as shown in this place ("PWM" inside a driver's channel). */
  label: string;
  choices: PinChoices;
  /** Problems about this role (shown beside it). */
  problems: Problem[];
  canEdit: boolean;
  onPin: (pin: string | null) => void;
  onLock: (locked: boolean) => void;
}

const suitText = (c: PinChoice) => `${pinName(c.pin)} · ${c.note}`;
const otherText = (c: PinChoice) => `${pinName(c.pin)} — ${c.note}`;

/**
 * One role's pin: a list offering the pins that suit the role first, then every other pin with
 * the problem it would draw; a lock that keeps the pin during automatic assignment; and the
 * role's problems right beneath.
 */
export function PinPicker({ demand, label, choices, problems, canEdit, onPin, onLock }: PinPickerProps) {
  const { highlight, setHighlight } = useHighlight();
  const id = fieldDomId(demand.path);
  const lit = isRoleLit(highlight, demand.side, demand.key, demand.pin);
  const worst = problems.find((p) => p.severity === 'error') ?? problems[0];
  const enter = () => setHighlight({ side: demand.side, pin: demand.pin, roleKey: demand.key });
  const leave = () => setHighlight(null);
  // The closed list cuts a long choice off at its width; the whole text shows on hover.
  const chosen =
    choices.suits.find((c) => c.pin.id === demand.pin) ?? choices.others.find((c) => c.pin.id === demand.pin);
  const chosenText = chosen ? (choices.suits.includes(chosen) ? suitText(chosen) : otherText(chosen)) : undefined;
  return (
    <div
      data-role={demand.key}
      data-lit={lit || undefined}
      onMouseEnter={enter}
      onMouseLeave={leave}
      onFocus={enter}
      onBlur={leave}
      className={cx(
        'rounded-md px-2 py-1.5 transition-colors',
        lit ? 'bg-accent-soft/70' : worst?.severity === 'error' ? 'bg-error-soft/40' : worst ? 'bg-warn-soft/40' : '',
      )}
    >
      <div className="grid grid-cols-[minmax(7rem,10rem)_1fr_auto] items-center gap-2">
        <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
          {label}
          {!demand.required && <span className="font-normal text-ink-faint"> (optional)</span>}
        </label>
        <select
          id={id}
          data-field={roleFieldKey(demand)}
          title={chosenText}
          value={demand.pin ?? ''}
          disabled={!canEdit}
          aria-invalid={worst?.severity === 'error' || undefined}
          aria-describedby={problems.length > 0 ? `${id}-problems` : undefined}
          onChange={(e) => onPin(e.target.value === '' ? null : e.target.value)}
          className={cx(
            'h-8 w-full min-w-0 rounded-md border bg-paper-raised px-2 font-mono text-[13px] text-ink disabled:bg-paper-sunken disabled:text-ink-muted',
            worst?.severity === 'error' ? 'border-error' : worst ? 'border-warn' : 'border-rule-strong',
          )}
        >
          <option value="">{demand.required ? '— no pin yet —' : 'Not connected'}</option>
          <optgroup label="Suits this role">
            {choices.suits.map((c) => (
              <option key={c.pin.id} value={c.pin.id}>
                {suitText(c)}
              </option>
            ))}
          </optgroup>
          <optgroup label="Other pins — will show a problem">
            {choices.unknownPin && (
              <option value={choices.unknownPin}>{`${choices.unknownPin} — not a pin of this board`}</option>
            )}
            {choices.others.map((c) => (
              <option key={c.pin.id} value={c.pin.id}>
                {otherText(c)}
              </option>
            ))}
          </optgroup>
        </select>
        <LockToggle
          locked={demand.locked}
          roleLabel={demand.label}
          disabled={!canEdit || demand.pin === null}
          onChange={onLock}
        />
      </div>
      {problems.length > 0 && (
        <div id={`${id}-problems`} className="mt-1 space-y-0.5 pl-[min(10rem,30%)]">
          {problems.map((p) => (
            <ProblemLine key={`${p.code}-${p.message}`} problem={p} className="text-[13px]" />
          ))}
        </div>
      )}
    </div>
  );
}
