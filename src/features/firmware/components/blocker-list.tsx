import { Link } from 'react-router';
import type { FirmwareBlocker } from '@shared/schemas/firmware';
import { fieldLink } from '../lib/field-link';

/** Reasons the firmware cannot be generated, each leading to the field to change. */
export function BlockerList({ title, blockers }: { title: string; blockers: FirmwareBlocker[] }) {
  return (
    <section
      role="alert"
      aria-labelledby="fw-blockers-title"
      className="rounded-lg border border-error/40 bg-error-soft/40"
    >
      <h2
        id="fw-blockers-title"
        className="border-b border-error/25 px-4 py-2 text-base font-semibold text-error-strong"
      >
        {title}
      </h2>
      <ul className="max-h-64 divide-y divide-error/15 overflow-y-auto">
        {blockers.map((blocker) => {
          const href = fieldLink(blocker.path);
          return (
            <li key={blocker.path.join('.')} className="flex items-start justify-between gap-3 px-4 py-1.5 text-sm">
              <span>
                <span aria-hidden="true" className="mr-2 font-bold text-error">
                  ✕
                </span>
                <span className="font-semibold text-error-strong">{blocker.message}</span>{' '}
                <code className="text-xs text-ink-muted">{blocker.path.join('.')}</code>
              </span>
              {href && (
                <Link
                  to={href}
                  relative="path"
                  className="shrink-0 rounded px-1 font-semibold text-accent-strong hover:underline"
                >
                  Show field
                </Link>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
