import type { Problem } from '@shared/problems/problem';
import { useHighlight } from '../hooks/wiring-highlight';
import { useShowField } from '../hooks/use-show-field';
import { isRemoteProblem, wiringFieldFor } from '../lib/wiring-problems';
import { SeverityIcon } from './severity-icon';

/** The section's problems with their hints; each leads to the field it is about. */
export function WiringProblemList({ problems }: { problems: Problem[] }) {
  const { setHighlight } = useHighlight();
  const showField = useShowField();
  const errors = problems.filter((p) => p.severity === 'error').length;
  const warnings = problems.length - errors;
  if (problems.length === 0) {
    return (
      <p
        role="status"
        className="flex items-center gap-2 rounded-md border border-accent/30 bg-accent-soft px-3 py-2 text-sm text-accent-strong"
      >
        <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
          <circle cx="8" cy="8" r="6.5" fill="currentColor" />
          <path
            d="M5 8.2l2 2 4-4.2"
            fill="none"
            stroke="white"
            strokeWidth="1.8"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </svg>
        No wiring problems: every role has a pin that can do it.
      </p>
    );
  }
  const show = (p: Problem) => {
    showField(wiringFieldFor(p.path));
    if (p.pins[0]) setHighlight({ side: isRemoteProblem(p) ? 'remote' : 'robot', pin: p.pins[0], roleKey: null });
  };
  return (
    <section aria-labelledby="wiring-problems-title" className="rounded-lg border border-rule bg-paper-raised">
      <h2
        id="wiring-problems-title"
        className="flex flex-wrap items-baseline gap-x-3 border-b border-rule px-4 py-2 text-base font-semibold"
      >
        Wiring problems
        <span className="text-sm font-normal text-ink-muted">
          {errors} error{errors === 1 ? '' : 's'}, {warnings} warning{warnings === 1 ? '' : 's'} · choose one to go to
          its field
        </span>
      </h2>
      <ul className="max-h-52 divide-y divide-rule overflow-y-auto">
        {problems.map((p, i) => (
          <li key={`${p.code}-${i}`}>
            <button
              type="button"
              onClick={() => show(p)}
              className="flex w-full items-start gap-2 px-4 py-1.5 text-left hover:bg-paper-sunken focus-visible:bg-paper-sunken"
            >
              <SeverityIcon severity={p.severity} className="mt-0.5" />
              <span className="text-sm">
                <span
                  className={
                    p.severity === 'error' ? 'font-semibold text-error-strong' : 'font-semibold text-warn-strong'
                  }
                >
                  {p.message}
                </span>
                <span className="text-ink-muted"> — {p.hint}</span>
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
