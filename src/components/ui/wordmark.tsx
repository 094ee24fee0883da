import { cx } from './cx';

/** The Mixwright mark: three wheels around a chassis ring, seen from above. */
export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-2 font-bold tracking-tight text-ink', className)}>
      <svg viewBox="0 0 32 32" className="size-7" aria-hidden="true">
        <rect width="32" height="32" rx="6" fill="var(--color-ink)" />
        <circle cx="16" cy="16.5" r="7" fill="none" stroke="var(--color-paper)" strokeWidth="2" />
        <g fill="#2bb3a3">
          <rect x="12" y="3" width="8" height="4" rx="1" />
          <rect x="12" y="3" width="8" height="4" rx="1" transform="rotate(120 16 16.5)" />
          <rect x="12" y="3" width="8" height="4" rx="1" transform="rotate(240 16 16.5)" />
        </g>
      </svg>
      <span className="text-xl">Mixwright</span>
    </span>
  );
}
