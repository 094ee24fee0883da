import type { ProblemCount } from '@shared/schemas/history';

/** "2 errors · 1 warning", or "no problems", coloured by the worst. */
export function ProblemCountText({ problems }: { problems: ProblemCount }) {
  const { errors, warnings } = problems;
  if (errors === 0 && warnings === 0) return <span className="text-ink-faint">no problems</span>;
  const parts = [
    errors > 0 && `${errors} ${errors === 1 ? 'error' : 'errors'}`,
    warnings > 0 && `${warnings} ${warnings === 1 ? 'warning' : 'warnings'}`,
  ].filter(Boolean);
  return <span className={errors > 0 ? 'font-semibold text-error' : 'text-warn-strong'}>{parts.join(' · ')}</span>;
}
