import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { cx } from './cx';

export const inputClasses =
  'block w-full rounded-md border bg-paper-raised px-3 py-2 text-ink shadow-[inset_0_1px_0_rgba(29,42,68,0.04)] placeholder:text-ink-faint focus:border-accent focus:outline-none focus-visible:outline-2 focus-visible:outline-accent focus-visible:outline-offset-1 disabled:bg-paper-sunken';

export interface FieldShellProps {
  label: string;
  hint?: ReactNode;
  error?: string;
  children: (ids: { inputId: string; describedBy: string | undefined }) => ReactNode;
  className?: string;
}

/** Label, control, hint and error, wired together for screen readers. */
export function FieldShell({ label, hint, error, children, className }: FieldShellProps) {
  const inputId = useId();
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  // The error replaces the hint, so only what is on screen is read out.
  const describedBy = error ? errorId : hint ? hintId : undefined;
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={inputId} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      {children({ inputId, describedBy })}
      {hint && !error && (
        <p id={hintId} className="text-sm text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-semibold text-error">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      )}
    </div>
  );
}

export interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** What every control inside a FieldShell carries: its id, the error state and the description. */
export function controlAttributes(
  { inputId, describedBy }: { inputId: string; describedBy: string | undefined },
  error: string | undefined,
  extraClass?: string,
) {
  return {
    id: inputId,
    'aria-invalid': error ? true : undefined,
    'aria-describedby': describedBy,
    className: cx(inputClasses, extraClass, error ? 'border-error' : 'border-rule-strong'),
  };
}

export function TextField({ label, hint, error, className, ...input }: TextFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} className={className}>
      {(ids) => <input {...controlAttributes(ids, error)} {...input} />}
    </FieldShell>
  );
}

export interface TextAreaFieldProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextAreaField({ label, hint, error, className, ...textarea }: TextAreaFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} className={className}>
      {(ids) => <textarea {...controlAttributes(ids, error)} {...textarea} />}
    </FieldShell>
  );
}
