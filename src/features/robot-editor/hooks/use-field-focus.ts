import { useEffect } from 'react';

/** The element showing a field: the exact `data-field`, else the nearest enclosing path that has one. */
export function findFieldElement(root: ParentNode, key: string): HTMLElement | null {
  const parts = key.split('.');
  for (let n = parts.length; n > 0; n -= 1) {
    const candidate = parts.slice(0, n).join('.');
    const found = root.querySelector<HTMLElement>(`[data-field="${CSS.escape(candidate)}"]`);
    if (found) return found;
  }
  return null;
}

/** A short ring around the field, so the eye finds it after the scroll. */
function flash(element: HTMLElement): void {
  element.animate?.(
    [
      { boxShadow: '0 0 0 4px rgba(15, 118, 110, 0.55)', backgroundColor: 'rgba(219, 239, 235, 1)' },
      { boxShadow: '0 0 0 4px rgba(15, 118, 110, 0)', backgroundColor: 'rgba(219, 239, 235, 0)' },
    ],
    { duration: 1800, easing: 'ease-out' },
  );
}

/**
 * When `fieldKey` is set, waits for the section to show that field (sections load on demand),
 * then scrolls to it, focuses it and flashes it, and calls `onDone`.
 */
export function useFieldFocus(
  fieldKey: string | null,
  root: React.RefObject<HTMLElement | null>,
  onDone: () => void,
): void {
  useEffect(() => {
    if (!fieldKey) return;
    let frame = 0;
    let tries = 0;
    const look = () => {
      const element = root.current ? findFieldElement(root.current, fieldKey) : null;
      if (element) {
        element.scrollIntoView({ block: 'center' });
        if (element.tabIndex < 0 && !element.matches('input, select, textarea, button, a[href]'))
          element.setAttribute('tabindex', '-1');
        element.focus({ preventScroll: true });
        flash(element);
        onDone();
      } else if (tries++ < 120) {
        frame = requestAnimationFrame(look);
      } else {
        onDone();
      }
    };
    frame = requestAnimationFrame(look);
    return () => cancelAnimationFrame(frame);
  }, [fieldKey, root, onDone]);
}
