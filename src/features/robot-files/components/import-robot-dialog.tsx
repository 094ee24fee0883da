import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { errorMessage, isApiError } from '@/lib/api-client';
import type { RobotSummary } from '@shared/schemas/robots';
import { useImportRobot, type ImportRobotAnswer } from '../api/import-robot';
import { IMPORT_ACCEPT } from './export-import-panel';
import { NotesList } from './notes-list';

interface ImportRobotDialogProps {
  teamId: string;
  /** Called after the import, e.g. to open the new robot. */
  onImported?: (robot: RobotSummary) => void;
}

function ImportForm({
  teamId,
  onDone,
  onCancel,
}: {
  teamId: string;
  onDone: (answer: ImportRobotAnswer) => void;
  onCancel: () => void;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const importing = useImportRobot(teamId);
  const ids = { file: useId(), name: useId() };
  const nameError = isApiError(importing.error) ? importing.error.fields.name : undefined;
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (file) importing.mutate({ file, name: name.trim() || undefined }, { onSuccess: onDone });
      }}
    >
      <label htmlFor={ids.file} className="block text-sm font-semibold text-ink-soft">
        Configuration file (.json) or firmware bundle (.zip)
      </label>
      <input
        id={ids.file}
        type="file"
        accept={IMPORT_ACCEPT}
        onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        className="block text-sm"
        autoFocus
      />
      <label htmlFor={ids.name} className="block text-sm font-semibold text-ink-soft">
        Robot name (optional: the file’s own name otherwise)
      </label>
      <input
        id={ids.name}
        value={name}
        maxLength={60}
        onChange={(e) => setName(e.target.value)}
        aria-invalid={nameError ? true : undefined}
        className="block w-full rounded-md border border-rule-strong bg-paper-raised px-3 py-1.5"
      />
      {nameError && <p className="text-sm font-semibold text-error">{nameError}</p>}
      <FormError message={importing.isError && !nameError ? errorMessage(importing.error) : undefined} />
      <div className="flex gap-2">
        <Button type="submit" busy={importing.isPending} disabled={!file}>
          Import robot
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** A button that opens a dialog to import a JSON configuration or a bundle zip as a new robot. */
export function ImportRobotDialog({ teamId, onImported }: ImportRobotDialogProps) {
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState<ImportRobotAnswer | null>(null);
  const opener = useRef<HTMLButtonElement>(null);
  const titleId = useId();
  const close = () => {
    setOpen(false);
    setDone(null);
    opener.current?.focus();
  };
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && close();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });
  return (
    <>
      <Button ref={opener} variant="secondary" onClick={() => setOpen(true)}>
        Import a robot
      </Button>
      {open && (
        <div
          className="fixed inset-0 z-40 flex items-start justify-center bg-ink/30 p-4 pt-[12vh]"
          onMouseDown={(e) => e.target === e.currentTarget && close()}
        >
          <div
            role="dialog"
            aria-modal="true"
            aria-labelledby={titleId}
            className="w-full max-w-md space-y-4 rounded-lg border border-rule bg-paper-raised p-5 shadow-lg"
          >
            <h2 id={titleId} className="text-lg font-semibold">
              Import a robot
            </h2>
            {done ? (
              <div className="space-y-3">
                <FormNotice message={`${done.robot.name} was added with revision 1.`} />
                <NotesList notes={done.notes} />
                <div className="flex gap-2">
                  {onImported && <Button onClick={() => onImported(done.robot)}>Open {done.robot.name}</Button>}
                  <Button variant="secondary" onClick={close}>
                    Close
                  </Button>
                </div>
              </div>
            ) : (
              <ImportForm teamId={teamId} onDone={setDone} onCancel={close} />
            )}
          </div>
        </div>
      )}
    </>
  );
}
