import { useEffect, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { useDraftFields } from './draft-fields-context';
import { compactInputClasses } from './number-input';

export interface EditColumn {
  title: string;
  unit?: string;
  /** What the column means, shown on hover. */
  hint?: string;
}

/**
 * A table of draft rows (motors, channels): a caption for screen readers, column headings with
 * their units, and a blank heading over the remove buttons.
 */
export function EditTable({
  field,
  caption,
  columns,
  fullWidth,
  children,
}: {
  field: string;
  caption: string;
  columns: EditColumn[];
  fullWidth?: boolean;
  children: ReactNode;
}) {
  return (
    <div className="overflow-x-auto" data-field={field}>
      <table className={cx(fullWidth && 'w-full', 'border-collapse text-left text-sm')}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-rule-strong text-xs text-ink-muted">
          <tr>
            {columns.map((c, i) => (
              <th
                key={c.title}
                scope="col"
                className={cx(i === 0 ? 'py-1 pr-1.5' : 'px-1.5 py-1', 'font-semibold')}
                title={c.hint}
              >
                <span className="tracking-wide uppercase">{c.title}</span>
                {c.unit && ` (${c.unit})`}
              </th>
            ))}
            <th scope="col" className="w-10">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">{children}</tbody>
      </table>
    </div>
  );
}

/** The last cell of a row: a button removing the row, when it may go. */
export function RemoveCell({ what, show, onRemove }: { what: string; show: boolean; onRemove: () => void }) {
  return (
    <td className="py-1 pl-1.5 text-right">
      {show && (
        <Button size="sm" variant="quiet" aria-label={`Remove ${what}`} title={`Remove ${what}`} onClick={onRemove}>
          ✕
        </Button>
      )}
    </td>
  );
}

type CheckedEdit = { ok: true; config: RobotConfig } | { ok: false; reason: string };

/**
 * For edits that may be refused (a name already taken, a channel number in use): applies an
 * accepted one to the draft, and keeps the reason of a refused one to show under the table.
 */
export function useCheckedEdit(): { error: string | null; apply: (result: CheckedEdit) => boolean } {
  const { update } = useDraftFields();
  const [error, setError] = useState<string | null>(null);
  const apply = (result: CheckedEdit) => {
    setError(result.ok ? null : result.reason);
    if (result.ok) update(() => result.config);
    return result.ok;
  };
  return { error, apply };
}

/** The reason the last checked edit was refused, under the table. */
export function EditRefusal({ error }: { error: string | null }) {
  if (!error) return null;
  return (
    <p role="alert" className="mt-2 text-xs font-semibold text-error">
      ✕ {error}
    </p>
  );
}

/**
 * A cell whose value the rest of the configuration refers to (a motor's name, a channel's
 * number): committed once, when the field is left or Enter is pressed, so everything that refers
 * to it follows at once. `onCommit` returns false to refuse the text, which then goes back to
 * the stored value; Escape goes back too.
 */
export function KeyCell({
  value,
  label,
  field,
  disabled,
  onCommit,
  numeric,
  className,
}: {
  value: string;
  label: string;
  field: string;
  disabled: boolean;
  onCommit: (text: string) => boolean;
  numeric?: boolean;
  className: string;
}) {
  const [text, setText] = useState(value);
  useEffect(() => setText(value), [value]);
  const commit = () => {
    if (!onCommit(text)) setText(value);
  };
  return (
    <input
      type="text"
      inputMode={numeric ? 'numeric' : undefined}
      aria-label={label}
      data-field={field}
      value={text}
      disabled={disabled}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setText(value);
      }}
      className={cx(compactInputClasses, 'border-rule-strong', className)}
    />
  );
}
