import { changeLabel, type SettingChange } from '@shared/history/setting-changes';

/** Changed fields as "label: before → after", the first `limit` of them. */
export function ChangeList({ changes, limit = Infinity }: { changes: readonly SettingChange[]; limit?: number }) {
  if (changes.length === 0) return <p className="text-sm text-ink-muted">No fields differ.</p>;
  const shown = changes.slice(0, limit);
  return (
    <>
      <ul className="max-h-56 divide-y divide-rule overflow-y-auto rounded border border-rule bg-paper text-sm">
        {shown.map((c) => (
          <li key={c.path.join('.')} className="grid grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)] gap-3 px-3 py-1">
            <span className="text-ink-soft">
              {changeLabel(c)}
              {c.kind !== 'changed' && <span className="text-ink-muted"> ({c.kind})</span>}
            </span>
            <span>
              <span className="text-ink-muted line-through decoration-ink-faint">{c.from ?? 'not set'}</span>
              <span aria-hidden="true" className="px-1 text-ink-faint">
                →
              </span>
              <span className="sr-only"> becomes </span>
              <span className="font-semibold">{c.to ?? 'not set'}</span>
            </span>
          </li>
        ))}
      </ul>
      {changes.length > shown.length && (
        <p className="mt-1 text-xs text-ink-muted">and {changes.length - shown.length} more.</p>
      )}
    </>
  );
}
