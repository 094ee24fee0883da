import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Dialog } from '@/components/ui/dialog';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import { rebaseDraft, rebaseRows, type RebaseRow } from '@shared/history/rebase-draft';
import { changeLabel } from '@shared/history/setting-changes';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail, RevisionSummary } from '@shared/schemas/robots';

/** Query options for one saved revision (the robots API's, handed in by the route). */
export type RevisionQuery = (number: number) => {
  queryKey: readonly unknown[];
  queryFn: () => Promise<RevisionDetail>;
  staleTime?: number;
};

export interface ConflictDialogProps {
  /** The newer head the server answered with; null = closed. */
  theirs: RevisionSummary | null;
  baseRevision: number;
  mine: RobotConfig;
  revisionQuery: RevisionQuery;
  onClose: () => void;
  /** The draft now starts from their revision, with the fields chosen. */
  onRebase: (theirs: RevisionDetail, draft: RobotConfig) => void;
}

/** Someone saved first: their revision and my draft side by side, field by field. */
export function ConflictDialog({ theirs, baseRevision, mine, revisionQuery, onClose, onRebase }: ConflictDialogProps) {
  return (
    <Dialog
      open={theirs !== null}
      onClose={onClose}
      size="max-w-5xl"
      title={theirs ? `Revision r${theirs.number} was saved while you were editing` : 'A newer revision exists'}
      description={
        theirs
          ? `${theirs.authorName ?? 'Someone'} saved “${theirs.message}”. Choose, field by field, what your draft keeps; nothing is saved until you save again.`
          : undefined
      }
    >
      {theirs && (
        <ConflictBody
          theirsNumber={theirs.number}
          baseRevision={baseRevision}
          mine={mine}
          revisionQuery={revisionQuery}
          onClose={onClose}
          onRebase={onRebase}
        />
      )}
    </Dialog>
  );
}

function ConflictBody({
  theirsNumber,
  baseRevision,
  mine,
  revisionQuery,
  onClose,
  onRebase,
}: Omit<ConflictDialogProps, 'theirs'> & { theirsNumber: number }) {
  const theirs = useQuery(revisionQuery(theirsNumber));
  const base = useQuery(revisionQuery(baseRevision));
  if (theirs.isPending || base.isPending) return <LoadingState label="Loading both revisions…" />;
  if (theirs.isError || base.isError) {
    const failed = theirs.isError ? theirs : base;
    return <ErrorState message={errorMessage(failed.error)} onRetry={() => failed.refetch()} />;
  }
  return <RebaseTable base={base.data} theirs={theirs.data} mine={mine} onClose={onClose} onRebase={onRebase} />;
}

const ORIGIN_WORDS: Record<RebaseRow['origin'], string> = {
  theirs: 'they changed it',
  mine: 'you changed it',
  both: 'both changed it',
};

function RebaseTable({
  base,
  theirs,
  mine,
  onClose,
  onRebase,
}: {
  base: RevisionDetail;
  theirs: RevisionDetail;
  mine: RobotConfig;
  onClose: () => void;
  onRebase: ConflictDialogProps['onRebase'];
}) {
  const rows = useMemo(() => rebaseRows(base.config, theirs.config, mine), [base, theirs, mine]);
  const [choices, setChoices] = useState<Record<string, 'theirs' | 'mine'>>({});
  const chosen = (row: RebaseRow) => choices[row.key] ?? row.suggested;
  const setAll = (side: 'theirs' | 'mine') => setChoices(Object.fromEntries(rows.map((r) => [r.key, side])));
  return (
    <div className="flex flex-col gap-3">
      {rows.length === 0 ? (
        <p className="text-sm">
          Your draft and r{theirs.number} hold the same settings: the draft simply moves onto r{theirs.number}.
        </p>
      ) : (
        <>
          <div className="flex items-center gap-2 text-sm">
            <span className="text-ink-muted">
              {rows.length} {rows.length === 1 ? 'field differs' : 'fields differ'}.
            </span>
            <Button size="sm" variant="secondary" onClick={() => setAll('theirs')}>
              Take all of theirs
            </Button>
            <Button size="sm" variant="secondary" onClick={() => setAll('mine')}>
              Keep all of mine
            </Button>
          </div>
          <div className="max-h-[50vh] overflow-y-auto rounded border border-rule">
            <table className="w-full border-collapse text-left text-sm">
              <caption className="sr-only">Fields that differ between r{theirs.number} and your draft</caption>
              <thead className="sticky top-0 bg-paper-raised text-xs tracking-wide text-ink-muted uppercase">
                <tr className="border-b border-rule-strong">
                  <th scope="col" className="px-2 py-1.5">
                    Field
                  </th>
                  <th scope="col" className="px-2 py-1.5">
                    Was (r{base.number})
                  </th>
                  <th scope="col" className="px-2 py-1.5">
                    Theirs (r{theirs.number})
                  </th>
                  <th scope="col" className="px-2 py-1.5">
                    Yours (draft)
                  </th>
                  <th scope="col" className="px-2 py-1.5">
                    Keep
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-rule">
                {rows.map((row) => (
                  <tr key={row.key} className={cx(row.origin === 'both' && 'bg-warn-soft/50')}>
                    <th scope="row" className="px-2 py-1.5 font-normal">
                      {changeLabel(row)}
                      <span
                        className={cx(
                          'block text-xs',
                          row.origin === 'both' ? 'font-semibold text-warn-strong' : 'text-ink-muted',
                        )}
                      >
                        {ORIGIN_WORDS[row.origin]}
                      </span>
                    </th>
                    <td className="px-2 py-1.5 text-ink-muted">{row.baseWords ?? 'not set'}</td>
                    <td className={cx('px-2 py-1.5', chosen(row) === 'theirs' && 'font-semibold')}>
                      {row.from ?? 'not set'}
                    </td>
                    <td className={cx('px-2 py-1.5', chosen(row) === 'mine' && 'font-semibold')}>
                      {row.to ?? 'not set'}
                    </td>
                    <td className="px-2 py-1.5 whitespace-nowrap">
                      <fieldset className="flex gap-3">
                        <legend className="sr-only">Keep for {changeLabel(row)}</legend>
                        {(['theirs', 'mine'] as const).map((side) => (
                          <label key={side} className="flex items-center gap-1">
                            <input
                              type="radio"
                              name={row.key}
                              checked={chosen(row) === side}
                              onChange={() => setChoices((c) => ({ ...c, [row.key]: side }))}
                              className="accent-accent"
                            />
                            {side === 'theirs' ? 'Theirs' : 'Mine'}
                          </label>
                        ))}
                      </fieldset>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose}>
          Decide later
        </Button>
        <Button onClick={() => onRebase(theirs, rebaseDraft(theirs.config, rows, choices))}>
          Move my draft onto r{theirs.number}
        </Button>
      </div>
    </div>
  );
}
