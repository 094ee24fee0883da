import { useCallback, useRef, type KeyboardEvent } from 'react';

/** A key's push on each component of a stick (e.g. { y: 1 } = up). */
export type KeyPush<C extends string> = Partial<Record<C, number>>;
export type KeyMap<C extends string> = Record<string, KeyPush<C>>;

/** Key names are matched case-insensitively ("w" and "W" are one key). */
const keyName = (key: string) => (key.length === 1 ? key.toLowerCase() : key);

/** Sum of the held keys' pushes, each component within −1..1; Shift halves it for fine moves. */
export function heldVector<C extends string>(
  held: Iterable<string>,
  map: KeyMap<C>,
  components: readonly C[],
  fine: boolean,
): Record<C, number> {
  const out = Object.fromEntries(components.map((c) => [c, 0])) as Record<C, number>;
  for (const key of held) {
    const push = map[key];
    if (!push) continue;
    for (const c of components) out[c] += push[c] ?? 0;
  }
  for (const c of components) out[c] = Math.max(-1, Math.min(1, out[c])) * (fine ? 0.5 : 1) + 0;
  return out;
}

/**
 * Keyboard driving for a focusable element: holding a mapped key pushes the stick, releasing
 * every key (or leaving the element) lets it spring back to centre.
 */
export function useHeldKeys<C extends string>(
  map: KeyMap<C>,
  components: readonly C[],
  onChange: (value: Record<C, number>) => void,
) {
  const held = useRef(new Set<string>());
  const shift = useRef(false);
  const emit = useCallback(
    () => onChange(heldVector(held.current, map, components, shift.current)),
    [map, components, onChange],
  );
  const onKeyDown = useCallback(
    (event: KeyboardEvent) => {
      const key = keyName(event.key);
      shift.current = event.shiftKey;
      if (key === 'Escape' || key === ' ') {
        held.current.clear();
        event.preventDefault();
        emit();
        return;
      }
      if (key === 'Shift') {
        emit();
        return;
      }
      if (!map[key] || event.altKey || event.ctrlKey || event.metaKey) return;
      event.preventDefault();
      held.current.add(key);
      emit();
    },
    [map, emit],
  );
  const onKeyUp = useCallback(
    (event: KeyboardEvent) => {
      const key = keyName(event.key);
      shift.current = event.shiftKey;
      if (key === 'Shift' || held.current.delete(key)) emit();
    },
    [emit],
  );
  const onBlur = useCallback(() => {
    held.current.clear();
    emit();
  }, [emit]);
  return { onKeyDown, onKeyUp, onBlur };
}
