import type { BoardPin } from '@shared/boards/board-types';
import type { PlanSide } from '@shared/pins/pin-demands';
import { cx } from '@/components/ui/cx';
import { isPinLit, useHighlight } from '../hooks/wiring-highlight';

export type PinState = 'free' | 'used' | 'warning' | 'error' | 'never';

/** Pins in runs that share a name prefix (D…, A…, GPIO…, GP…), as the board's headers group them. */
function runs(pins: BoardPin[]): { prefix: string; pins: BoardPin[] }[] {
  const out: { prefix: string; pins: BoardPin[] }[] = [];
  for (const pin of pins) {
    const prefix = pin.id.replace(/\d+$/, '');
    if (out.at(-1)?.prefix === prefix) out.at(-1)!.pins.push(pin);
    else out.push({ prefix, pins: [pin] });
  }
  return out;
}

// Each state has a shape of its own besides its colour: a heavy base for a pin in use, a mark
// after the code for a problem, hatching and a strike for a pin that can never be used.
const CELL: Record<PinState, string> = {
  free: 'border-rule-strong bg-paper-raised text-ink-soft',
  used: 'border-accent border-b-[4px] bg-accent-soft text-accent-strong',
  warning: 'border-warn border-b-[4px] bg-warn-soft font-semibold text-warn-strong',
  error: 'border-error-strong border-b-[4px] bg-error font-semibold text-white',
  never:
    'border-rule bg-[repeating-linear-gradient(135deg,transparent_0_3px,var(--color-rule-strong)_3px_4px)] text-ink-faint line-through',
};

const MARK: Record<PinState, string> = { free: '', used: '', warning: '!', error: '×', never: '' };

function Cell({ state, text, lit = false }: { state: PinState; text: string; lit?: boolean }) {
  return (
    <span
      className={cx(
        'grid h-6 min-w-6 place-items-center rounded-[3px] border px-0.5 font-mono text-[10px] leading-none',
        CELL[state],
        lit && 'ring-2 ring-ink ring-offset-1',
      )}
    >
      {text}
      {MARK[state]}
    </span>
  );
}

/**
 * The board's pins at a glance: one cell per pin with its code, in runs like the board's
 * headers. Pointing at a cell lights the pin and its roles; choosing one shows it in the list.
 * The list below carries the same facts in words, so this strip is hidden from screen readers.
 */
export function PinStrip({
  pins,
  side,
  stateOf,
  onChoose,
}: {
  pins: BoardPin[];
  side: PlanSide;
  stateOf: (pin: BoardPin) => PinState;
  onChoose: (pin: BoardPin) => void;
}) {
  const { highlight, setHighlight } = useHighlight();
  return (
    <div aria-hidden="true" className="space-y-1.5">
      {runs(pins).map((run) => (
        <div key={run.prefix + run.pins[0].id} className="flex items-start gap-2">
          <span className="w-9 shrink-0 pt-1 text-right font-mono text-[10px] text-ink-muted">{run.prefix}</span>
          <div className="flex flex-wrap gap-[3px]">
            {run.pins.map((pin) => {
              const state = stateOf(pin);
              return (
                <span
                  key={pin.id}
                  data-strip-pin={pin.id}
                  data-state={state}
                  title={`${pin.id}${state === 'free' ? ', free' : state === 'never' ? ', never usable' : state === 'used' ? ', in use' : `, ${state}`}`}
                  onMouseEnter={() => setHighlight({ side, pin: pin.id, roleKey: null })}
                  onMouseLeave={() => setHighlight(null)}
                  onClick={() => onChoose(pin)}
                  className="cursor-pointer select-none"
                >
                  <Cell state={state} text={pin.id.slice(run.prefix.length)} lit={isPinLit(highlight, side, pin.id)} />
                </span>
              );
            })}
          </div>
        </div>
      ))}
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1 pl-11 text-[11px] text-ink-muted">
        {(
          [
            ['free', 'free'],
            ['used', 'in use'],
            ['warning', 'warning'],
            ['error', 'error'],
            ['never', 'never usable'],
          ] as const
        ).map(([state, words]) => (
          <span key={state} className="flex items-center gap-1">
            <Cell state={state} text="9" />
            {words}
          </span>
        ))}
      </p>
    </div>
  );
}
