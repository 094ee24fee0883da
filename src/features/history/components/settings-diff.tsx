import type { SettingChange } from '@shared/history/setting-changes';

const SECTION_ORDER = ['Robot', 'Chassis', 'Motors', 'Controls', 'Wiring', 'Safety', 'Power', 'Firmware'];

function Value({ value, tone }: { value: string | null; tone: 'old' | 'new' }) {
  if (value === null) return <span className="text-ink-faint">—</span>;
  const colours = tone === 'old' ? 'bg-error-soft text-error-strong' : 'bg-accent-soft text-accent-strong';
  return <span className={`rounded px-1.5 py-0.5 font-mono text-[0.85rem] ${colours}`}>{value}</span>;
}

/** Each changed setting in words, grouped by section, old value beside new. */
export function SettingsDiff({ changes, from, to }: { changes: SettingChange[]; from: number; to: number }) {
  if (changes.length === 0)
    return (
      <p className="text-ink-muted">
        No setting differs between r{from} and r{to}.
      </p>
    );
  const sections = SECTION_ORDER.filter((s) => changes.some((c) => c.section === s));
  return (
    <table className="w-full border-collapse text-left text-[0.95rem]">
      <caption className="sr-only">{`Settings changed from revision ${from} to ${to}`}</caption>
      <colgroup>
        <col className="w-[45%]" />
        <col />
        <col className="w-8" />
        <col />
      </colgroup>
      <thead className="sr-only">
        <tr>
          <th scope="col">Setting</th>
          <th scope="col">In r{from}</th>
          <th scope="col">Becomes</th>
          <th scope="col">In r{to}</th>
        </tr>
      </thead>
      {sections.map((section) => (
        <tbody key={section} className="divide-y divide-rule">
          <tr>
            <th
              scope="colgroup"
              colSpan={4}
              className="pt-3 pb-1 text-left text-sm font-semibold tracking-wide text-ink-muted uppercase"
            >
              {section}
            </th>
          </tr>
          {changes
            .filter((c) => c.section === section)
            .map((change) => (
              <tr key={change.path.join('.')} title={change.path.join('.')}>
                <th scope="row" className="py-1.5 pr-3 text-left font-normal">
                  <span className="font-semibold">{change.subject}</span>
                  {change.field && <span className="text-ink-soft"> · {change.field}</span>}
                  {change.kind !== 'changed' && <span className="text-ink-muted"> ({change.kind})</span>}
                </th>
                <td className="py-1.5 pr-2">
                  <Value value={change.from} tone="old" />
                </td>
                <td className="py-1.5 text-center text-ink-muted" aria-label="becomes">
                  →
                </td>
                <td className="py-1.5 pl-2">
                  <Value value={change.to} tone="new" />
                </td>
              </tr>
            ))}
        </tbody>
      ))}
    </table>
  );
}
