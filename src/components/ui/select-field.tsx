import type { ReactNode, Ref, SelectHTMLAttributes } from 'react';
import { controlAttributes, FieldShell } from './text-field';

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
  options: { value: string; label: string }[];
  ref?: Ref<HTMLSelectElement>;
}

export function SelectField({ label, hint, error, options, className, ...select }: SelectFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} className={className}>
      {(ids) => (
        <select {...controlAttributes(ids, error, 'pr-8')} {...select}>
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </FieldShell>
  );
}
