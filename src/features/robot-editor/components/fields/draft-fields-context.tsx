import { createContext, useContext, useMemo, type ReactNode } from 'react';
import { pathKey, valueAt, withValueAt, type FieldPath } from '@shared/history/field-path';
import type { RobotConfig } from '@shared/schemas/robot-config';

export interface DraftFieldsValue {
  config: RobotConfig;
  /** Sets one field of the draft. */
  set: (path: FieldPath, value: unknown) => void;
  /** Replaces the draft with a function of it (for edits that touch several fields). */
  update: (change: (config: RobotConfig) => RobotConfig) => void;
  errors: Readonly<Record<string, string>>;
  /** Viewers: every field read-only. */
  disabled: boolean;
}

const DraftFieldsContext = createContext<DraftFieldsValue | null>(null);

/** Gives the field components below it the draft, its errors and a way to change it. */
export function DraftFields({
  config,
  onChange,
  errors = {},
  disabled,
  children,
}: {
  config: RobotConfig;
  onChange: (next: RobotConfig) => void;
  errors?: Readonly<Record<string, string>>;
  disabled: boolean;
  children: ReactNode;
}) {
  const value = useMemo<DraftFieldsValue>(
    () => ({
      config,
      set: (path, v) => onChange(withValueAt(config, path, v)),
      update: (change) => onChange(change(config)),
      errors,
      disabled,
    }),
    [config, onChange, errors, disabled],
  );
  return <DraftFieldsContext.Provider value={value}>{children}</DraftFieldsContext.Provider>;
}

export function useDraftFields(): DraftFieldsValue {
  const value = useContext(DraftFieldsContext);
  if (!value) throw new Error('Draft fields need a <DraftFields> around them');
  return value;
}

/** One field's value, error and setter. */
export function useDraftField<T>(path: FieldPath) {
  const { config, set, errors, disabled } = useDraftFields();
  const key = pathKey(path);
  return { key, value: valueAt(config, path) as T, error: errors[key], set: (v: T) => set(path, v), disabled };
}

/** The errors of fields under a path prefix (a table's rows), in order. */
export function useErrorsUnder(prefix: FieldPath): [string, string][] {
  const { errors } = useDraftFields();
  const start = pathKey(prefix);
  return Object.entries(errors).filter(([key]) => key === start || key.startsWith(`${start}.`));
}
