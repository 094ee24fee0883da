import { CAUTIONS_FOOTER, CAUTIONS_INTRO, CAUTIONS_TITLE, SAFETY_CAUTIONS } from '@shared/safety/cautions';
import { cx } from './cx';

/** The safety cautions, shown wherever someone is about to build, flash or drive a robot. */
export function Cautions({ className, compact = false }: { className?: string; compact?: boolean }) {
  return (
    <aside
      aria-labelledby="cautions-title"
      className={cx('rounded-lg border border-warn/35 bg-warn-soft/70 px-5 py-4 text-ink', className)}
    >
      <h2 id="cautions-title" className="flex items-center gap-2 font-semibold text-warn-strong">
        <svg viewBox="0 0 20 20" className="size-5 shrink-0" aria-hidden="true">
          <path d="M10 2.5 18.5 17h-17z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
          <path d="M10 8v4.2M10 14.4v.1" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
        </svg>
        {CAUTIONS_TITLE}
      </h2>
      <p className="mt-1 text-sm text-ink-soft">{CAUTIONS_INTRO}</p>
      <ul
        className={cx('mt-2 list-disc space-y-1 pl-5 text-sm text-ink-soft marker:text-warn', compact && 'space-y-0.5')}
      >
        {SAFETY_CAUTIONS.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="mt-2 text-xs text-ink-muted">{CAUTIONS_FOOTER}</p>
    </aside>
  );
}
