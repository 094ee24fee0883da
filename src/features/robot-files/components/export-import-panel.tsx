import { useId, useState } from 'react';
import { buttonClasses, Button } from '@/components/ui/button';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { errorMessage } from '@/lib/api-client';
import { configFileName } from '@shared/history/file-names';
import { useImportRevision } from '../api/import-revision';
import { NotesList } from './notes-list';

export const IMPORT_ACCEPT = '.json,.zip,application/json,application/zip';

function ExportLink({
  robotId,
  robotName,
  revisions,
  headRevision,
}: {
  robotId: string;
  robotName: string;
  revisions: number[];
  headRevision: number;
}) {
  const [revision, setRevision] = useState(headRevision);
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-3">
      <label htmlFor={id} className="flex flex-col gap-1 text-sm font-semibold text-ink-soft">
        Revision
        <select
          id={id}
          value={revision}
          onChange={(e) => setRevision(Number(e.target.value))}
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1.5 font-mono font-normal text-ink"
        >
          {revisions.map((n) => (
            <option key={n} value={n}>
              r{n}
            </option>
          ))}
        </select>
      </label>
      <a
        href={`/api/robots/${encodeURIComponent(robotId)}/revisions/${revision}/export`}
        download={configFileName(robotName, revision)}
        className={buttonClasses('secondary')}
      >
        Download {configFileName(robotName, revision)}
      </a>
    </div>
  );
}

function ImportRevisionForm({ robotId, headRevision }: { robotId: string; headRevision: number }) {
  const [file, setFile] = useState<File | null>(null);
  const [message, setMessage] = useState('');
  const importing = useImportRevision(robotId);
  const ids = { file: useId(), message: useId() };
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    if (file) importing.mutate({ file, baseRevision: headRevision, message: message.trim() || undefined });
  };
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Import as a new revision">
      <label htmlFor={ids.file} className="block text-sm font-semibold text-ink-soft">
        Configuration file (.json) or firmware bundle (.zip)
      </label>
      <input
        id={ids.file}
        type="file"
        accept={IMPORT_ACCEPT}
        onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        className="block text-sm"
      />
      <label htmlFor={ids.message} className="block text-sm font-semibold text-ink-soft">
        Message (optional)
      </label>
      <input
        id={ids.message}
        value={message}
        maxLength={500}
        onChange={(e) => setMessage(e.target.value)}
        placeholder="Imported from the file name"
        className="block w-full rounded-md border border-rule-strong bg-paper-raised px-3 py-1.5"
      />
      <Button type="submit" busy={importing.isPending} disabled={!file}>
        Import as revision {headRevision + 1}
      </Button>
      <FormError message={importing.isError ? errorMessage(importing.error) : undefined} />
      {importing.data && (
        <div className="space-y-1">
          <FormNotice message={`Saved as revision ${importing.data.revision}.`} />
          <NotesList notes={importing.data.notes} />
        </div>
      )}
    </form>
  );
}

/** Download any revision's configuration as JSON; editors bring one back in as the next revision. */
export function ExportImportPanel(props: {
  robotId: string;
  robotName: string;
  revisions: number[];
  headRevision: number;
  canEdit: boolean;
}) {
  return (
    <div className="space-y-5">
      <ExportLink {...props} />
      {props.canEdit && (
        <div className="border-t border-rule pt-4">
          <ImportRevisionForm robotId={props.robotId} headRevision={props.headRevision} />
        </div>
      )}
    </div>
  );
}
