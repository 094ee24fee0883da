import { cx } from '@/components/ui/cx';

/** Keeps a pin where it is when "Assign free pins" runs. */
export function LockToggle({
  locked,
  roleLabel,
  disabled,
  onChange,
}: {
  locked: boolean;
  roleLabel: string;
  disabled?: boolean;
  onChange: (locked: boolean) => void;
}) {
  return (
    <button
      type="button"
      aria-pressed={locked}
      aria-label={`Keep the pin of ${roleLabel} when assigning`}
      title={locked ? 'Locked: “Assign free pins” keeps this pin' : 'Unlocked: “Assign free pins” may move this pin'}
      disabled={disabled}
      onClick={() => onChange(!locked)}
      className={cx(
        'inline-flex h-8 items-center gap-1 rounded-md border px-2 text-xs font-semibold disabled:cursor-not-allowed disabled:opacity-60',
        locked
          ? 'border-ink-soft bg-ink text-paper'
          : 'border-rule-strong bg-paper-raised text-ink-muted hover:bg-paper-sunken',
      )}
    >
      <svg viewBox="0 0 16 16" className="size-3.5" aria-hidden="true">
        <rect x="3" y="7" width="10" height="7.5" rx="1.2" fill="currentColor" />
        <path
          d={locked ? 'M5.2 7V5a2.8 2.8 0 0 1 5.6 0v2' : 'M5.2 7V5a2.8 2.8 0 0 1 5.5-.8'}
          fill="none"
          stroke="currentColor"
          strokeWidth="1.5"
        />
      </svg>
      {locked ? 'Locked' : 'Lock'}
    </button>
  );
}
