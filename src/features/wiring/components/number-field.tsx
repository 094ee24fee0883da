import { useEffect, useState } from 'react';
import { cx } from '@/components/ui/cx';

export interface NumberFieldProps {
  id: string;
  /** The configuration path it edits, as `data-field`, so a problem's link can lead here. */
  field?: string;
  label: string;
  value: number | null;
  onCommit: (value: number | null) => void;
  min: number;
  max: number;
  unit: string;
  /** Shown when empty; an empty field commits null. */
  placeholder?: string;
  integer?: boolean;
  disabled?: boolean;
  className?: string;
}

/**
 * A number typed freely: the draft stays as typed and only a valid value reaches the
 * configuration, so the layout does not jump and half-typed numbers are not saved.
 */
export function NumberField({
  id,
  field,
  label,
  value,
  onCommit,
  min,
  max,
  unit,
  placeholder,
  integer = false,
  disabled,
  className,
}: NumberFieldProps) {
  const [draft, setDraft] = useState(value === null ? '' : String(value));
  const [error, setError] = useState<string | null>(null);

  // Follow changes made elsewhere (a suggestion button, undo) unless the draft already means them.
  useEffect(() => {
    setDraft((current) => (parse(current) === value ? current : value === null ? '' : String(value)));
    setError(null);
  }, [value]);

  const change = (text: string) => {
    setDraft(text);
    if (text.trim() === '') {
      if (placeholder === undefined) return setError(`${label} is needed`);
      setError(null);
      return onCommit(null);
    }
    const n = parse(text);
    if (n === null || (integer && !Number.isInteger(n)))
      return setError(`${label} must be a${integer ? ' whole' : ''} number`);
    if (n < min || n > max) return setError(`${label} must be between ${min} and ${max} ${unit}`);
    setError(null);
    onCommit(n);
  };

  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <div className="flex items-center gap-1.5">
        <input
          id={id}
          data-field={field}
          inputMode="decimal"
          value={draft}
          placeholder={placeholder}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => change(e.target.value)}
          className={cx(
            'h-8 w-24 rounded-md border bg-paper-raised px-2 text-right font-mono text-[13px] tabular-nums text-ink placeholder:text-ink-faint disabled:bg-paper-sunken',
            error ? 'border-error' : 'border-rule-strong',
          )}
        />
        <span className="text-sm text-ink-muted">{unit}</span>
      </div>
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1 text-[13px] font-semibold text-error">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      )}
    </div>
  );
}

function parse(text: string): number | null {
  if (text.trim() === '') return null;
  const n = Number(text.replace(',', '.'));
  return Number.isFinite(n) ? n : null;
}
