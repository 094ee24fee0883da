import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-client';
import { useRestoreRevision } from '../api/restore-revision';

/** "Restore" on a revision row: asks for an optional note, then makes a new revision copying it. */
export function RestoreAction({
  robotId,
  revision,
  headRevision,
}: {
  robotId: string;
  revision: number;
  headRevision: number;
}) {
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const restore = useRestoreRevision(robotId);
  const noteId = useId();
  if (!open) {
    return (
      <Button size="sm" variant="secondary" onClick={() => setOpen(true)} aria-label={`Restore revision ${revision}`}>
        Restore
      </Button>
    );
  }
  const submit = () =>
    restore.mutate(
      { revision, baseRevision: headRevision, note: note.trim() || undefined },
      { onSuccess: () => setOpen(false) },
    );
  return (
    <div className="flex min-w-64 flex-col items-end gap-1.5 text-left">
      <label htmlFor={noteId} className="self-start text-sm font-semibold text-ink-soft">
        Why restore revision {revision}? (optional)
      </label>
      <input
        id={noteId}
        value={note}
        maxLength={500}
        onChange={(e) => setNote(e.target.value)}
        onKeyDown={(e) => e.key === 'Enter' && submit()}
        className="w-full rounded-md border border-rule-strong bg-paper-raised px-2 py-1 text-sm"
        autoFocus
      />
      {restore.isError && (
        <p role="alert" className="text-sm text-error">
          {errorMessage(restore.error)}
        </p>
      )}
      <div className="flex gap-2">
        <Button size="sm" variant="quiet" onClick={() => setOpen(false)}>
          Cancel
        </Button>
        <Button size="sm" busy={restore.isPending} onClick={submit}>
          Restore as revision {headRevision + 1}
        </Button>
      </div>
    </div>
  );
}
