import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage, isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import type { FlashEntry } from '@shared/schemas/flash-log';
import { useFlashLog } from '../api/get-flash-log';
import { useRecordFlash } from '../api/record-flash';

/** The browser's local time as a datetime-local value ("2026-03-14T16:05"). */
function localNow(): string {
  const now = new Date();
  return new Date(now.getTime() - now.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
}

function FlashForm({
  robotId,
  revisions,
  headRevision,
}: {
  robotId: string;
  revisions: number[];
  headRevision: number;
}) {
  const [revision, setRevision] = useState(headRevision);
  const [when, setWhen] = useState(localNow);
  const [note, setNote] = useState('');
  const record = useRecordFlash(robotId);
  const ids = { revision: useId(), when: useId(), note: useId() };
  const fieldError = (name: string) => (isApiError(record.error) ? record.error.fields[name] : undefined);
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    record.mutate({ revision, flashedAt: new Date(when).toISOString(), note }, { onSuccess: () => setNote('') });
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" aria-label="Record a flash">
      <label className="flex flex-col gap-1 text-sm font-semibold text-ink-soft" htmlFor={ids.revision}>
        Revision
        <select
          id={ids.revision}
          value={revision}
          onChange={(e) => setRevision(Number(e.target.value))}
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1.5 font-mono font-normal text-ink"
        >
          {revisions.map((n) => (
            <option key={n} value={n}>
              r{n}
              {n === headRevision ? ' (head)' : ''}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold text-ink-soft" htmlFor={ids.when}>
        Flashed at
        <input
          id={ids.when}
          type="datetime-local"
          value={when}
          onChange={(e) => setWhen(e.target.value)}
          aria-invalid={fieldError('flashedAt') ? true : undefined}
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1.5 font-normal text-ink"
        />
      </label>
      <label className="flex min-w-48 flex-1 flex-col gap-1 text-sm font-semibold text-ink-soft" htmlFor={ids.note}>
        Note
        <input
          id={ids.note}
          value={note}
          maxLength={500}
          onChange={(e) => setNote(e.target.value)}
          placeholder="Which board, what was tested"
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1.5 font-normal text-ink"
        />
      </label>
      <Button type="submit" busy={record.isPending}>
        Record flash
      </Button>
      <FormError className="basis-full" message={record.isError ? errorMessage(record.error) : undefined} />
    </form>
  );
}

function FlashTable({ flashes }: { flashes: FlashEntry[] }) {
  if (flashes.length === 0)
    return (
      <p className="text-ink-muted">Nothing recorded yet. Record each upload, so everyone knows what the robot runs.</p>
    );
  return (
    <ol className="divide-y divide-rule">
      {flashes.map((flash) => (
        <li key={flash.id} className="flex flex-wrap items-baseline gap-x-3 py-2">
          <span className="font-mono font-semibold">r{flash.revisionNumber}</span>
          <time dateTime={flash.flashedAt} className="text-ink-muted">
            {formatDateTime(flash.flashedAt)}
          </time>
          <span>{flash.flashedByName ?? 'Someone'}</span>
          {flash.note && <span className="text-ink-soft">“{flash.note}”</span>}
        </li>
      ))}
    </ol>
  );
}

/** Record that a revision went onto the robot, and the log of every such upload. */
export function FlashLogPanel({
  robotId,
  revisions,
  headRevision,
  canEdit,
}: {
  robotId: string;
  revisions: number[];
  headRevision: number;
  canEdit: boolean;
}) {
  const log = useFlashLog(robotId);
  return (
    <div className="space-y-4">
      {canEdit && <FlashForm robotId={robotId} revisions={revisions} headRevision={headRevision} />}
      {log.isPending && <LoadingState label="Loading the flash log…" />}
      {log.isError && <ErrorState message={errorMessage(log.error)} onRetry={() => log.refetch()} />}
      {log.data && <FlashTable flashes={log.data} />}
    </div>
  );
}
