import { useCallback } from 'react';
import { useSearchParams } from 'react-router';

/**
 * Leads to a field of the section through the editor's own mechanism: it sets `?field=<dotted
 * path>`, and the editor shell scrolls to the element with that `data-field`, focuses and
 * flashes it (see src/lib/editor-sections.ts). The jump replaces the history entry, like the shell's own.
 */
export function useShowField(): (fieldKey: string) => void {
  const [, setSearchParams] = useSearchParams();
  return useCallback(
    (fieldKey: string) =>
      setSearchParams(
        (params) => {
          params.set('field', fieldKey);
          return params;
        },
        { replace: true },
      ),
    [setSearchParams],
  );
}
