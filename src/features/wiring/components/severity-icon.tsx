import type { Problem } from '@shared/problems/problem';
import { cx } from '@/components/ui/cx';

/** Distinct shapes for the two severities (a square cross, a triangle), never colour alone. */
export function SeverityIcon({ severity, className }: { severity: Problem['severity']; className?: string }) {
  if (severity === 'error') {
    return (
      <svg viewBox="0 0 16 16" className={cx('size-4 shrink-0 text-error', className)} role="img" aria-label="Error">
        <rect x="1.5" y="1.5" width="13" height="13" rx="2.5" fill="currentColor" />
        <path d="M5.3 5.3l5.4 5.4M10.7 5.3l-5.4 5.4" stroke="white" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
    );
  }
  return (
    <svg viewBox="0 0 16 16" className={cx('size-4 shrink-0 text-warn', className)} role="img" aria-label="Warning">
      <path d="M8 1.6 15 14.2H1z" fill="currentColor" strokeLinejoin="round" />
      <path d="M8 6v3.8M8 11.8v.2" stroke="white" strokeWidth="1.7" strokeLinecap="round" />
    </svg>
  );
}

/** One problem as a line: icon, the sentence, and (optionally) what to do about it. */
export function ProblemLine({
  problem,
  showHint = true,
  className,
}: {
  problem: Problem;
  showHint?: boolean;
  className?: string;
}) {
  return (
    <p className={cx('flex items-start gap-1.5 text-sm', className)}>
      <SeverityIcon severity={problem.severity} className="mt-0.5" />
      <span>
        <span
          className={
            problem.severity === 'error' ? 'font-semibold text-error-strong' : 'font-semibold text-warn-strong'
          }
        >
          {problem.message}
        </span>
        {showHint && problem.hint && <span className="text-ink-muted"> {problem.hint}</span>}
      </span>
    </p>
  );
}
