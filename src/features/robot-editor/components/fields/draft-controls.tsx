import type { InputHTMLAttributes, SelectHTMLAttributes } from 'react';
import { cx } from '@/components/ui/cx';
import type { useDraftField } from './draft-fields-context';
import { compactInputClasses, NumberInput, type NumberInputProps } from './number-input';

// The bare controls of a draft field (from useDraftField), with no label of their own: the
// labelled fields (draft-fields.tsx) frame them, the table cells (draft-cells.tsx) name them
// with aria-label.

export interface Option<V extends string | number | null> {
  value: V;
  label: string;
}

const encode = (v: string | number | null) => (v === null ? '' : String(v));
const borderFor = (error: string | undefined) => (error ? 'border-error' : 'border-rule-strong');

type DraftField<T> = ReturnType<typeof useDraftField<T>>;
type ControlProps<T, E> = { field: DraftField<T>; width: string } & Omit<
  E,
  'value' | 'onChange' | 'disabled' | 'className'
>;

export function DraftSelect<V extends string | number | null>({
  field,
  width,
  options,
  className,
  ...rest
}: ControlProps<V, SelectHTMLAttributes<HTMLSelectElement>> & { options: Option<V>[]; className: string }) {
  return (
    <select
      {...rest}
      data-field={field.key}
      value={encode(field.value)}
      disabled={field.disabled}
      aria-invalid={field.error ? true : undefined}
      onChange={(e) => field.set(options.find((o) => encode(o.value) === e.target.value)?.value as V)}
      className={cx(compactInputClasses, className, width, borderFor(field.error))}
    >
      {options.map((o) => (
        <option key={encode(o.value)} value={encode(o.value)}>
          {o.label}
        </option>
      ))}
    </select>
  );
}

export function DraftTextInput({ field, width, ...rest }: ControlProps<string, InputHTMLAttributes<HTMLInputElement>>) {
  return (
    <input
      {...rest}
      type="text"
      autoComplete="off"
      data-field={field.key}
      value={field.value ?? ''}
      disabled={field.disabled}
      aria-invalid={field.error ? true : undefined}
      onChange={(e) => field.set(e.target.value)}
      className={cx(compactInputClasses, width, borderFor(field.error))}
    />
  );
}

export function DraftNumberInput({
  field,
  width,
  ...rest
}: ControlProps<number | null, Omit<NumberInputProps, 'onCommit' | 'invalid'>>) {
  return (
    <NumberInput
      {...rest}
      data-field={field.key}
      value={field.value}
      onCommit={field.set}
      invalid={Boolean(field.error)}
      disabled={field.disabled}
      className={width}
    />
  );
}
