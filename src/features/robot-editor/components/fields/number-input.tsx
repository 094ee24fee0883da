import { useEffect, useState, type InputHTMLAttributes } from 'react';
import { cx } from '@/components/ui/cx';

export const compactInputClasses =
  'rounded border bg-paper-raised px-2 py-1 text-ink tabular-nums shadow-[inset_0_1px_0_rgba(29,42,68,0.04)] focus:border-accent focus:outline-none focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent disabled:bg-paper-sunken disabled:text-ink-soft';

export interface NumberInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'value' | 'onChange' | 'type'> {
  value: number | null;
  /** Called with the typed number; NaN while the text is not a number, null for empty text when allowed. */
  onCommit: (value: number | null) => void;
  /** Empty text means "none" (null) rather than a missing number. */
  allowEmpty?: boolean;
  /** Shown value = stored value × scale (100 shows a fraction as percent). */
  scale?: number;
  invalid?: boolean;
}

const shown = (value: number | null, scale: number) =>
  value === null || Number.isNaN(value) ? '' : String(Math.round(value * scale * 1e6) / 1e6);

function parse(text: string, allowEmpty: boolean): number | null {
  const t = text.trim().replace(',', '.').replace('−', '-');
  if (t === '') return allowEmpty ? null : Number.NaN;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : Number.NaN;
}

/**
 * A number typed as text: what was typed stays on screen ("1.", "-") while the draft gets the
 * number (or NaN, which the schema reports). Fixed width, so nothing moves while typing.
 */
export function NumberInput({
  value,
  onCommit,
  allowEmpty = false,
  scale = 1,
  invalid = false,
  className,
  ...rest
}: NumberInputProps) {
  const [text, setText] = useState(() => shown(value, scale));
  useEffect(() => {
    const typed = parse(text, allowEmpty);
    const same =
      typed === null
        ? value === null
        : value !== null && (Object.is(typed / scale, value) || Math.abs(typed / scale - value) < 1e-9);
    if (!same && !(Number.isNaN(typed) && value !== null && Number.isNaN(value))) setText(shown(value, scale));
    // Only an outside change of the value rewrites the text; typing must not be reformatted.
  }, [value, scale]);
  return (
    <input
      type="text"
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      value={text}
      aria-invalid={invalid || undefined}
      onChange={(e) => {
        setText(e.target.value);
        const n = parse(e.target.value, allowEmpty);
        onCommit(n === null ? null : n / scale);
      }}
      className={cx(compactInputClasses, 'text-right', invalid ? 'border-error' : 'border-rule-strong', className)}
      {...rest}
    />
  );
}
