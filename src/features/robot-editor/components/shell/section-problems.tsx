import { useEffect, useId, useRef, useState } from 'react';
import { cx } from '@/components/ui/cx';
import type { EditorProblem } from '../../lib/section-problems';
import type { SectionId } from '@/lib/editor-sections';
import { ProblemList } from './problem-list';

function summary(problems: readonly EditorProblem[]): string {
  const errors = problems.filter((p) => p.severity === 'error').length;
  const warnings = problems.length - errors;
  if (problems.length === 0) return 'no errors or warnings';
  return [
    errors > 0 && `${errors} ${errors === 1 ? 'error' : 'errors'}`,
    warnings > 0 && `${warnings} ${warnings === 1 ? 'warning' : 'warnings'}`,
  ]
    .filter(Boolean)
    .join(', ');
}

/**
 * The current section's problems: one line of fixed height above the section, and the list
 * on request as a sheet over the content, so problems coming and going while someone types
 * never move the fields.
 */
export function SectionProblems({
  problems,
  available,
  label,
}: {
  problems: readonly EditorProblem[];
  available: readonly SectionId[];
  label: string;
}) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const box = useRef<HTMLDivElement>(null);
  const errors = problems.some((p) => p.severity === 'error');
  useEffect(() => {
    if (!open) return;
    const close = (event: MouseEvent | KeyboardEvent) => {
      if (event instanceof KeyboardEvent ? event.key === 'Escape' : !box.current?.contains(event.target as Node))
        setOpen(false);
    };
    document.addEventListener('mousedown', close);
    document.addEventListener('keydown', close);
    return () => {
      document.removeEventListener('mousedown', close);
      document.removeEventListener('keydown', close);
    };
  }, [open]);
  useEffect(() => {
    if (problems.length === 0) setOpen(false);
  }, [problems.length]);
  return (
    <div ref={box} className="relative mb-4">
      <div
        className={cx(
          'flex h-10 items-center gap-3 rounded-lg border px-4 text-sm',
          problems.length === 0
            ? 'border-rule bg-paper-raised text-ink-muted'
            : errors
              ? 'border-error/30 bg-error-soft/60'
              : 'border-warn/30 bg-warn-soft/60',
        )}
      >
        <p
          role="status"
          className={cx('font-semibold', problems.length > 0 && (errors ? 'text-error-strong' : 'text-warn-strong'))}
        >
          {label}: {summary(problems)}
        </p>
        {problems.length > 0 && (
          <button
            type="button"
            aria-expanded={open}
            aria-controls={id}
            onClick={() => setOpen((o) => !o)}
            className="ml-auto rounded px-2 py-0.5 font-semibold text-accent-strong hover:underline"
          >
            {open ? 'Hide the list' : 'Show the list'}
          </button>
        )}
      </div>
      {open && (
        <section
          id={id}
          aria-label={`Problems in ${label}`}
          className="absolute inset-x-0 top-11 z-20 max-h-[60vh] overflow-y-auto rounded-lg border border-rule-strong bg-paper-raised px-4 py-2 shadow-lg"
          onClick={(event) => {
            if ((event.target as HTMLElement).closest('a')) setOpen(false);
          }}
        >
          <ProblemList problems={problems} available={available} />
        </section>
      )}
    </div>
  );
}
