import { cx } from './cx';

/** The form's own error (not tied to one field), announced when it appears. */
export function FormError({ message, className }: { message?: string; className?: string }) {
  if (!message) return null;
  return (
    <div
      role="alert"
      className={cx('rounded-md border border-error/30 bg-error-soft px-3 py-2 text-sm text-error-strong', className)}
    >
      {message}
    </div>
  );
}

/** A confirmation after something worked. */
export function FormNotice({ message, className }: { message?: string; className?: string }) {
  if (!message) return null;
  return (
    <div
      role="status"
      className={cx(
        'rounded-md border border-accent/30 bg-accent-soft px-3 py-2 text-sm text-accent-strong',
        className,
      )}
    >
      {message}
    </div>
  );
}
