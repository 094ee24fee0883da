import type { FieldPath } from '@shared/history/field-path';
import { fieldName } from '@shared/history/field-words';
import { useDraftField, useErrorsUnder } from './draft-fields-context';
import { DraftNumberInput, DraftSelect, DraftTextInput, type Option } from './draft-controls';

// Table cells: no visible label (the column heading is one; aria-label names the cell), no
// error text in the cell (the row would grow): a red border, and the reason below the table.

export function NumberCell({
  path,
  label,
  width = 'w-20',
  scale,
  allowEmpty,
}: {
  path: FieldPath;
  label: string;
  width?: string;
  scale?: number;
  allowEmpty?: boolean;
}) {
  const field = useDraftField<number | null>(path);
  return (
    <DraftNumberInput
      field={field}
      width={width}
      scale={scale}
      allowEmpty={allowEmpty}
      aria-label={label}
      title={field.error}
    />
  );
}

export function TextCell({ path, label, width = 'w-32' }: { path: FieldPath; label: string; width?: string }) {
  const field = useDraftField<string>(path);
  return <DraftTextInput field={field} width={width} aria-label={label} title={field.error} />;
}

export function SelectCell<V extends string | number | null>({
  path,
  label,
  options,
  width = 'w-32',
}: {
  path: FieldPath;
  label: string;
  options: Option<V>[];
  width?: string;
}) {
  const field = useDraftField<V>(path);
  return (
    <DraftSelect
      field={field}
      options={options}
      width={width}
      className="py-1"
      aria-label={label}
      title={field.error}
    />
  );
}

export function CheckboxCell({ path, label }: { path: FieldPath; label: string }) {
  const field = useDraftField<boolean>(path);
  return (
    <input
      type="checkbox"
      aria-label={label}
      data-field={field.key}
      checked={field.value}
      disabled={field.disabled}
      onChange={(e) => field.set(e.target.checked)}
      className="size-4 accent-accent"
    />
  );
}

/**
 * The reasons for a table's invalid cells, listed under the table (so the table itself never
 * moves). `rowName` names a row from its index.
 */
export function TableErrors({ prefix, rowName }: { prefix: FieldPath; rowName: (index: number) => string }) {
  const errors = useErrorsUnder(prefix);
  if (errors.length === 0) return null;
  return (
    <ul role="alert" className="mt-2 space-y-0.5 text-xs font-semibold text-error">
      {errors.map(([key, message]) => {
        const rest = key.split('.').slice(prefix.length);
        const row = /^\d+$/.test(rest[0] ?? '') ? rowName(Number(rest[0])) : null;
        const field = rest.length > 1 ? fieldName(rest[rest.length - 1]) : null;
        return (
          <li key={key}>
            ✕ {[row, field].filter(Boolean).join(', ') || 'This table'}: {message}
          </li>
        );
      })}
    </ul>
  );
}
