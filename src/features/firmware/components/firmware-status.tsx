import { buttonClasses } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';

export interface FirmwareStatusProps {
  /** The files shown are the unsaved draft's. */
  showingDraft: boolean;
  headRevision: number;
  /** The zip of the head revision, or null when it cannot be generated. */
  downloadHref: string | null;
  /** Why there is no download, when there is none. */
  blockedReason: string | null;
  /** The line the firmware shown prints at start (null while unknown). */
  bootLine: string | null;
}

/** Which configuration the files are from, the download, and the boot line to look for on the robot. */
export function FirmwareStatus({
  showingDraft,
  headRevision,
  downloadHref,
  blockedReason,
  bootLine,
}: FirmwareStatusProps) {
  return (
    <div
      className={cx(
        'flex flex-wrap items-start justify-between gap-3 rounded-lg border px-4 py-3',
        showingDraft ? 'border-warn/40 bg-warn-soft/60' : 'border-rule bg-paper-raised',
      )}
    >
      <div className="min-w-0 flex-1 space-y-1">
        <p role="status" className={cx('text-sm', showingDraft ? 'text-warn-strong' : 'text-ink-soft')}>
          {showingDraft ? (
            <>
              <span className="font-semibold">Showing the firmware of your unsaved changes</span> (it becomes revision{' '}
              {headRevision + 1} when saved). The download and the compile check use revision {headRevision} as saved;
              save to include your changes.
            </>
          ) : (
            <>
              <span className="font-semibold">Revision {headRevision} as saved.</span> This is the firmware the download
              holds.
            </>
          )}
        </p>
        {bootLine && (
          <p className="text-sm text-ink-muted">
            At start the robot prints{' '}
            <code className="rounded bg-paper-sunken px-1.5 py-0.5 font-mono text-[0.8rem] break-all text-ink">
              {bootLine}
            </code>
          </p>
        )}
      </div>
      <div className="flex flex-col items-end gap-1">
        {downloadHref ? (
          <a href={downloadHref} download className={buttonClasses('primary')}>
            Download revision {headRevision} (.zip)
          </a>
        ) : (
          <span className={cx(buttonClasses('primary'), 'pointer-events-none opacity-50')} aria-disabled="true">
            Download revision {headRevision} (.zip)
          </span>
        )}
        {!downloadHref && blockedReason && (
          <span className="max-w-64 text-right text-xs text-ink-muted">{blockedReason}</span>
        )}
      </div>
    </div>
  );
}
