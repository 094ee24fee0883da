import { cx } from '@/components/ui/cx';
import { formatUsage, usageOf, type UsageTone } from '../lib/usage';

const FILL: Record<UsageTone, string> = { ok: 'bg-accent', warn: 'bg-warn', error: 'bg-error' };
const TEXT: Record<UsageTone, string> = {
  ok: 'text-ink-muted',
  warn: 'text-warn-strong font-semibold',
  error: 'text-error-strong font-semibold',
};

/** How much of the board's flash or RAM the build takes, as a bar against the limit. */
export function UsageBar({
  label,
  bytes,
  max,
  kind,
}: {
  label: string;
  bytes: number;
  max: number;
  kind: 'flash' | 'ram';
}) {
  const usage = usageOf(bytes, max, kind);
  const text = `${usage.percent} % (${formatUsage(bytes, max)})`;
  return (
    <div className="grid grid-cols-[3.5rem_minmax(0,1fr)] items-center gap-x-2 gap-y-0.5 text-sm">
      <span className="font-semibold text-ink-soft">{label}</span>
      <div
        role="meter"
        aria-label={`${label} used`}
        aria-valuemin={0}
        aria-valuemax={max}
        aria-valuenow={Math.min(bytes, max)}
        aria-valuetext={text}
        className="h-2.5 overflow-hidden rounded-full border border-rule bg-paper-sunken"
      >
        <div className={cx('h-full', FILL[usage.tone])} style={{ width: `${Math.min(100, usage.percent)}%` }} />
      </div>
      <span className={cx('col-start-2 text-xs', TEXT[usage.tone])}>
        {text}
        {usage.tone === 'warn' && kind === 'ram' && ' — little RAM is left for the stack'}
        {usage.tone === 'error' && ' — does not fit this board'}
      </span>
    </div>
  );
}
