import type { ReactNode } from 'react';
import { cx } from './cx';

type Tone = 'accent' | 'neutral' | 'warn';

const tones: Record<Tone, string> = {
  accent: 'border-accent/30 bg-accent-soft text-accent-strong',
  neutral: 'border-rule-strong bg-paper text-ink-soft',
  warn: 'border-warn/30 bg-warn-soft text-warn-strong',
};

export function Badge({ tone = 'neutral', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={cx('inline-flex items-center rounded border px-1.5 py-0.5 text-xs font-semibold', tones[tone])}>
      {children}
    </span>
  );
}
