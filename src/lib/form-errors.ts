import type { FieldValues, Path, UseFormReturn, UseFormSetError } from 'react-hook-form';
import { errorMessage, isApiError } from './api-client';

/**
 * Puts the server's per-field reasons beside the matching inputs; when the server named no
 * shown field, its message becomes the form's own error.
 */
export function showServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): void {
  let placed = 0;
  if (isApiError(error)) {
    for (const [path, message] of Object.entries(error.fields)) {
      if ((fields as readonly string[]).includes(path)) {
        setError(path as Path<T>, { type: 'server', message });
        placed += 1;
      }
    }
  }
  if (placed === 0 || (isApiError(error) && placed < Object.keys(error.fields).length)) {
    setError('root.server', { type: 'server', message: errorMessage(error) });
  }
}

/**
 * The form's submit handler: checks the fields with the form's schema, runs the request, and
 * on failure puts the server's reasons beside the named fields.
 */
export function submitWithServerErrors<T extends FieldValues, Out>(
  form: UseFormReturn<T, unknown, Out>,
  fields: readonly Path<T>[],
  action: (values: Out) => Promise<unknown>,
) {
  return form.handleSubmit(async (values) => {
    try {
      await action(values);
    } catch (error) {
      showServerErrors(error, form.setError, fields);
    }
  });
}
