import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import type { PlanSide } from '@shared/pins/pin-demands';

/** What the pointer or keyboard focus rests on: a pin of one board, and maybe one role on it. */
export interface Highlight {
  side: PlanSide;
  pin: string | null;
  roleKey: string | null;
}

interface HighlightValue {
  highlight: Highlight | null;
  setHighlight: (next: Highlight | null) => void;
}

const HighlightContext = createContext<HighlightValue>({ highlight: null, setHighlight: () => {} });

/** Shares the highlighted pin and role between the role pickers and the board's pin list. */
export function HighlightProvider({ children }: { children: ReactNode }) {
  const [highlight, setState] = useState<Highlight | null>(null);
  const setHighlight = useCallback((next: Highlight | null) => setState(next), []);
  const value = useMemo(() => ({ highlight, setHighlight }), [highlight, setHighlight]);
  return <HighlightContext.Provider value={value}>{children}</HighlightContext.Provider>;
}

export function useHighlight(): HighlightValue {
  return useContext(HighlightContext);
}

/** Whether a role (on its pin) is the one highlighted, or sits on the highlighted pin. */
export function isRoleLit(h: Highlight | null, side: PlanSide, roleKey: string, pin: string | null): boolean {
  if (!h || h.side !== side) return false;
  return h.roleKey === roleKey || (h.pin !== null && h.pin === pin);
}

export function isPinLit(h: Highlight | null, side: PlanSide, pin: string): boolean {
  return !!h && h.side === side && h.pin === pin;
}
