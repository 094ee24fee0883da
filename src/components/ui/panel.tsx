import type { ReactNode } from 'react';
import { cx } from './cx';

/** A raised sheet of paper holding one part of a screen. */
export function Panel({
  title,
  description,
  actions,
  children,
  className,
  titleId,
  field,
}: {
  title?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  titleId?: string;
  /** The configuration path this panel shows, as `data-field`, so the editor's field links can lead here. */
  field?: string;
}) {
  return (
    <section
      aria-labelledby={titleId}
      data-field={field}
      className={cx('rounded-lg border border-rule bg-paper-raised shadow-[0_1px_2px_rgba(29,42,68,0.06)]', className)}
    >
      {(title || actions) && (
        <header className="flex flex-wrap items-start justify-between gap-3 border-b border-rule px-5 py-4">
          <div>
            {title && (
              <h2 id={titleId} className="text-lg font-semibold text-ink">
                {title}
              </h2>
            )}
            {description && <p className="mt-0.5 text-sm text-ink-muted">{description}</p>}
          </div>
          {actions && <div className="flex items-center gap-2">{actions}</div>}
        </header>
      )}
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}
