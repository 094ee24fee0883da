export type UsageTone = 'ok' | 'warn' | 'error';

export interface Usage {
  /** Whole percent, rounded up so "100 %" means full. */
  percent: number;
  tone: UsageTone;
}

// Common practice: keep RAM use of an AVR sketch under about three quarters, because the stack
// and the core's buffers need the rest at run time; flash only has to fit.
const WARN_AT: Record<'flash' | 'ram', number> = { flash: 0.9, ram: 0.75 };

/** How full a memory is, and whether that is fine, tight or too much. */
export function usageOf(bytes: number, max: number, kind: 'flash' | 'ram'): Usage {
  const share = max > 0 ? bytes / max : 1;
  const tone: UsageTone = share > 1 ? 'error' : share >= WARN_AT[kind] ? 'warn' : 'ok';
  return { percent: Math.ceil(share * 100), tone };
}

/** "12,345 of 32,256 bytes". */
export function formatUsage(bytes: number, max: number): string {
  const n = (v: number) => v.toLocaleString('en-GB');
  return `${n(bytes)} of ${n(max)} bytes`;
}
