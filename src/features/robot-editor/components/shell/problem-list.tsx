import { useId } from 'react';
import { Link } from 'react-router';
import { cx } from '@/components/ui/cx';
import { pathKey } from '@shared/history/field-path';
import { sectionOfPath, type SectionId } from '@/lib/editor-sections';
import type { EditorProblem } from '../../lib/section-problems';

/** Where a problem's field is shown, as a link target; null when this build has no such section. */
export function problemHref(problem: EditorProblem, available: readonly SectionId[]): string | null {
  const section = sectionOfPath(problem.path);
  if (!section || !available.includes(section)) return null;
  return `../${section}?field=${encodeURIComponent(pathKey(problem.path))}`;
}

/** Problems as a list: what is wrong, what to do, and a link to the field. */
export function ProblemList({
  problems,
  available,
  className,
}: {
  problems: readonly EditorProblem[];
  available: readonly SectionId[];
  className?: string;
}) {
  const id = useId();
  return (
    <ul className={cx('divide-y divide-rule', className)}>
      {problems.map((problem, index) => {
        const href = problemHref(problem, available);
        const error = problem.severity === 'error';
        const messageId = `${id}-${index}`;
        return (
          <li key={`${problem.code}-${pathKey(problem.path)}-${index}`} className="flex gap-2 py-1.5 text-sm">
            <span
              aria-hidden="true"
              className={cx('mt-0.5 w-4 shrink-0 text-center font-bold', error ? 'text-error' : 'text-warn')}
            >
              {error ? '✕' : '!'}
            </span>
            <div className="min-w-0 flex-1">
              <p id={messageId} className={cx('font-semibold', error ? 'text-error-strong' : 'text-warn-strong')}>
                <span className="sr-only">{error ? 'Error: ' : 'Warning: '}</span>
                {problem.message}
              </p>
              <p className="text-ink-muted">{problem.hint}</p>
            </div>
            {href && (
              <Link
                to={href}
                relative="path"
                aria-describedby={messageId}
                className="shrink-0 self-start rounded px-1 text-sm font-semibold text-accent-strong hover:underline"
              >
                Show field
              </Link>
            )}
          </li>
        );
      })}
    </ul>
  );
}
