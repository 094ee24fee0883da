import { useState, type KeyboardEvent } from 'react';
import type { BoardPin, BoardProfile } from '@shared/boards/board-types';
import type { PinDemand, PlanSide } from '@shared/pins/pin-demands';
import type { Problem } from '@shared/problems/problem';
import { cx } from '@/components/ui/cx';
import { isPinLit, isRoleLit, useHighlight } from '../hooks/wiring-highlight';
import { useShowField } from '../hooks/use-show-field';
import { abilityTags, type AbilityTone } from '../lib/pin-words';
import { problemsForPin, roleFieldKey } from '../lib/wiring-problems';
import { PinStrip, type PinState } from './pin-strip';
import { SeverityIcon } from './severity-icon';

type Filter = 'all' | 'used' | 'free' | 'problems';

const FILTERS: { id: Filter; label: string }[] = [
  { id: 'all', label: 'All' },
  { id: 'used', label: 'In use' },
  { id: 'free', label: 'Free' },
  { id: 'problems', label: 'With problems' },
];

const TONE: Record<AbilityTone, string> = {
  plain: 'border-rule-strong bg-paper text-ink-soft',
  caution: 'border-warn/40 bg-warn-soft text-warn-strong',
  never: 'border-error/40 bg-error-soft text-error-strong',
};

export interface BoardPinListProps {
  board: BoardProfile;
  side: PlanSide;
  /** The roles of this board side. */
  demands: PinDemand[];
  /** The section's problems (this list picks those that name a pin of this side). */
  problems: Problem[];
  /** Short words for a role in this list ("Driver 1 · A PWM"). */
  roleLabel: (demand: PinDemand) => string;
}

/**
 * Every pin of one board, in the board's order: its label and code, what it can do, which role
 * holds it now and what is wrong there. Pointing at a pin lights the roles on it, and back.
 */
export function BoardPinList({ board, side, demands, problems, roleLabel }: BoardPinListProps) {
  const [filter, setFilter] = useState<Filter>('all');
  // One tab stop for the whole list; the arrow keys move between pins (roving focus).
  const [active, setActive] = useState<string | null>(null);
  const rolesOn = (pin: BoardPin) => demands.filter((d) => d.pin === pin.id);
  const pinProblems = (pin: BoardPin) => problemsForPin(problems, pin.id, side === 'remote');
  const shown = board.pins.filter((pin) => {
    if (filter === 'used') return rolesOn(pin).length > 0;
    if (filter === 'free') return rolesOn(pin).length === 0 && !pin.flash;
    if (filter === 'problems') return pinProblems(pin).length > 0;
    return true;
  });
  const stateOf = (pin: BoardPin): PinState => {
    const problems = pinProblems(pin);
    if (pin.flash || (!pin.onHeader && !pin.builtinLed)) return 'never';
    if (problems.some((p) => p.severity === 'error')) return 'error';
    if (problems.length > 0) return 'warning';
    return rolesOn(pin).length > 0 ? 'used' : 'free';
  };
  const choose = (pin: BoardPin) => {
    setFilter('all');
    // After the list shows every pin again, bring this one into view and give it focus.
    requestAnimationFrame(() => {
      const row = document.querySelector<HTMLElement>(`[data-pin-side="${side}"][data-pin="${pin.id}"]`);
      row?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
      row?.focus({ preventScroll: true });
    });
  };
  const moveFocus = (event: KeyboardEvent<HTMLUListElement>) => {
    const rows = [...event.currentTarget.querySelectorAll<HTMLElement>(':scope > li[data-pin]')];
    const at = rows.findIndex((r) => r === document.activeElement);
    if (at < 0) return;
    const to = { ArrowDown: at + 1, ArrowUp: at - 1, Home: 0, End: rows.length - 1 }[event.key];
    if (to === undefined || !rows[to]) return;
    event.preventDefault();
    rows[to].focus();
  };
  const used = board.pins.filter((p) => rolesOn(p).length > 0).length;
  const troubled = board.pins.filter((p) => pinProblems(p).length > 0).length;
  return (
    <div>
      <PinStrip pins={board.pins} side={side} stateOf={stateOf} onChoose={choose} />
      <div className="mt-3 flex flex-wrap items-center justify-between gap-2 border-t border-rule pt-2">
        <p className="text-sm text-ink-muted" aria-live="polite">
          {used} of {board.pins.length} pins in use{troubled > 0 ? ` · ${troubled} with problems` : ''}
        </p>
        <div role="radiogroup" aria-label="Show pins" className="flex rounded-md border border-rule-strong text-xs">
          {FILTERS.map((f) => (
            <button
              key={f.id}
              type="button"
              role="radio"
              aria-checked={filter === f.id}
              onClick={() => setFilter(f.id)}
              className={cx(
                'px-2 py-1 font-semibold first:rounded-l-md last:rounded-r-md',
                filter === f.id ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunken',
              )}
            >
              {f.label}
            </button>
          ))}
        </div>
      </div>
      <ul
        aria-label={`${board.name} pins (arrow keys move between pins)`}
        onKeyDown={moveFocus}
        className="mt-2 divide-y divide-rule border-y border-rule"
      >
        {shown.map((pin) => (
          <PinRow
            key={pin.id}
            board={board}
            side={side}
            pin={pin}
            roles={rolesOn(pin)}
            problems={pinProblems(pin)}
            roleLabel={roleLabel}
            tabbable={pin.id === (active ?? shown[0]?.id)}
            onActive={() => setActive(pin.id)}
          />
        ))}
        {shown.length === 0 && <li className="py-3 text-sm text-ink-muted">No pin matches.</li>}
      </ul>
    </div>
  );
}

interface PinRowProps {
  tabbable: boolean;
  onActive: () => void;
  board: BoardProfile;
  side: PlanSide;
  pin: BoardPin;
  roles: PinDemand[];
  problems: Problem[];
  roleLabel: (demand: PinDemand) => string;
}

function PinRow({ board, side, pin, roles, problems, roleLabel, tabbable, onActive }: PinRowProps) {
  const { highlight, setHighlight } = useHighlight();
  const showField = useShowField();
  const lit = isPinLit(highlight, side, pin.id) || roles.some((d) => isRoleLit(highlight, side, d.key, d.pin));
  const worst = problems.find((p) => p.severity === 'error') ?? problems[0];
  const enter = () => setHighlight({ side, pin: pin.id, roleKey: null });
  const leave = () => setHighlight(null);
  const focus = () => {
    enter();
    onActive();
  };
  const state = pin.flash ? 'never' : worst ? worst.severity : roles.length > 0 ? 'used' : 'free';
  return (
    <li
      tabIndex={tabbable ? 0 : -1}
      data-pin={pin.id}
      data-pin-side={side}
      data-state={state}
      data-lit={lit || undefined}
      aria-label={`${pin.id}, code ${pin.code}${roles.length ? `, used for ${roles.map(roleLabel).join(', ')}` : ', free'}${problems.length ? `, ${problems.length} problem${problems.length > 1 ? 's' : ''}` : ''}`}
      onMouseEnter={enter}
      onMouseLeave={leave}
      onFocus={focus}
      onBlur={leave}
      className={cx(
        'relative grid grid-cols-[6.5rem_1fr] gap-x-2 py-1.5 pr-1 pl-3 outline-offset-[-2px] transition-colors',
        lit && 'bg-accent-soft',
        pin.flash &&
          'bg-[repeating-linear-gradient(135deg,transparent_0_6px,var(--color-grid)_6px_8px)] text-ink-faint',
      )}
    >
      <span
        aria-hidden="true"
        className={cx(
          'absolute top-1 bottom-1 left-0 w-1 rounded-r',
          state === 'error'
            ? 'bg-error'
            : state === 'warning'
              ? 'bg-warn'
              : state === 'used'
                ? 'bg-accent'
                : 'bg-transparent',
        )}
      />
      <div className="leading-tight">
        <span className={cx('block font-mono text-[15px] font-medium', pin.flash ? 'text-ink-faint' : 'text-ink')}>
          {pin.id}
        </span>
        <span className="block font-mono text-[11px] text-ink-muted">
          {pin.label !== pin.id && pin.label !== pin.code && <span title="Printed on the board">“{pin.label}” · </span>}
          <span title="Number the firmware uses">code {pin.code}</span>
        </span>
      </div>
      <div className="min-w-0">
        <div className="flex flex-wrap gap-1">
          {abilityTags(board, pin).map((tag) => (
            <span
              key={tag.text}
              title={tag.title}
              className={cx('rounded border px-1 py-px font-mono text-[11px] leading-4', TONE[tag.tone])}
            >
              {tag.text}
            </span>
          ))}
        </div>
        {roles.length > 0 && (
          <p className="mt-0.5 flex flex-wrap gap-x-2 text-[13px]">
            {roles.map((d) => (
              <button
                key={d.key}
                type="button"
                onClick={() => showField(roleFieldKey(d))}
                className="font-semibold text-accent-strong underline decoration-accent/30 underline-offset-2 hover:decoration-accent"
              >
                → {roleLabel(d)}
              </button>
            ))}
          </p>
        )}
        {problems.map((p) => (
          <p key={`${p.code}-${p.message}`} className="mt-0.5 flex items-start gap-1 text-[12px] leading-snug">
            <SeverityIcon severity={p.severity} className="size-3.5" />
            <span className={p.severity === 'error' ? 'text-error-strong' : 'text-warn-strong'}>{p.message}</span>
          </p>
        ))}
      </div>
    </li>
  );
}
