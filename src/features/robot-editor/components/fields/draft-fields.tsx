import { useId, type ReactNode } from 'react';
import { cx } from '@/components/ui/cx';
import type { FieldPath } from '@shared/history/field-path';
import { useDraftField } from './draft-fields-context';
import { DraftNumberInput, DraftSelect, DraftTextInput, type Option } from './draft-controls';

interface LabelledProps {
  path: FieldPath;
  label: string;
  hint?: ReactNode;
  className?: string;
}

/** Label above, control and unit in a row, then one line kept for the hint or the error. */
function FieldFrame({
  id,
  label,
  hint,
  error,
  children,
  className,
}: {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <div className="flex items-center gap-1.5">{children}</div>
      <p
        id={`${id}-note`}
        className={cx('min-h-5 text-xs leading-5', error ? 'font-semibold text-error' : 'text-ink-muted')}
      >
        {error ? `✕ ${error}` : hint}
      </p>
    </div>
  );
}

export function DraftNumberField({
  path,
  label,
  hint,
  unit,
  scale,
  allowEmpty,
  width = 'w-24',
  className,
}: LabelledProps & { unit?: string; scale?: number; allowEmpty?: boolean; width?: string }) {
  const id = useId();
  const field = useDraftField<number | null>(path);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={field.error} className={className}>
      <DraftNumberInput
        id={id}
        field={field}
        width={width}
        scale={scale}
        allowEmpty={allowEmpty}
        aria-describedby={`${id}-note`}
      />
      {unit && <span className="text-sm text-ink-muted">{unit}</span>}
    </FieldFrame>
  );
}

export function DraftSelectField<V extends string | number | null>({
  path,
  label,
  hint,
  options,
  width = 'w-56',
  className,
}: LabelledProps & { options: Option<V>[]; width?: string }) {
  const id = useId();
  const field = useDraftField<V>(path);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={field.error} className={className}>
      <DraftSelect
        id={id}
        field={field}
        options={options}
        width={width}
        className="py-1.5"
        aria-describedby={`${id}-note`}
      />
    </FieldFrame>
  );
}

export function DraftCheckbox({ path, label, hint, className }: LabelledProps) {
  const id = useId();
  const field = useDraftField<boolean>(path);
  return (
    <div className={cx('flex items-start gap-2', className)}>
      <input
        id={id}
        type="checkbox"
        data-field={field.key}
        checked={field.value}
        disabled={field.disabled}
        onChange={(e) => field.set(e.target.checked)}
        aria-describedby={hint ? `${id}-hint` : undefined}
        className="mt-1 size-4 accent-accent"
      />
      <div>
        <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
          {label}
        </label>
        {hint && (
          <p id={`${id}-hint`} className="text-xs text-ink-muted">
            {hint}
          </p>
        )}
      </div>
    </div>
  );
}

export function DraftTextField({ path, label, hint, width = 'w-64', className }: LabelledProps & { width?: string }) {
  const id = useId();
  const field = useDraftField<string>(path);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={field.error} className={className}>
      <DraftTextInput id={id} field={field} width={width} aria-describedby={`${id}-note`} />
    </FieldFrame>
  );
}
