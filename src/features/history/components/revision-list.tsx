import { Badge } from '@/components/ui/badge';
import { formatAgo, formatDate, formatDateTime } from '@/lib/format';
import type { HistoryEntry } from '@shared/schemas/history';
import { ProblemCountText } from './problem-count';
import { RestoreAction } from './restore-action';

export interface ComparePair {
  from: number;
  to: number;
}

interface RevisionListProps {
  robotId: string;
  revisions: HistoryEntry[];
  headRevision: number;
  /** The revision the newest flash log line names: what is on the robot now. */
  onRobot: number | null;
  pair: ComparePair | null;
  onPairChange: (pair: ComparePair) => void;
  canEdit: boolean;
}

function FlashedBadge({ entry, onRobot }: { entry: HistoryEntry; onRobot: number | null }) {
  if (entry.flashes.length === 0) return <span className="text-ink-faint">—</span>;
  const last = entry.flashes[0];
  const times = entry.flashes.length > 1 ? ` (${entry.flashes.length}×)` : '';
  return (
    <span
      title={entry.flashes.map((f) => `${formatDateTime(f.flashedAt)} by ${f.flashedByName ?? 'someone'}`).join('\n')}
    >
      <Badge tone={entry.number === onRobot ? 'accent' : 'neutral'}>
        {entry.number === onRobot ? 'on the robot' : 'flashed'} {formatDate(last.flashedAt)}
        {times}
      </Badge>
    </span>
  );
}

/** Every revision, newest first, with two radio columns that choose what to compare. */
export function RevisionList({
  robotId,
  revisions,
  headRevision,
  onRobot,
  pair,
  onPairChange,
  canEdit,
}: RevisionListProps) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-[0.95rem]">
        <caption className="sr-only">Revisions, newest first; choose two to compare</caption>
        <thead className="border-b border-rule-strong text-xs tracking-wide text-ink-muted uppercase">
          <tr>
            <th scope="col" className="py-2 pr-1 font-semibold">
              From
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              To
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Revision
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Message
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Saved
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Problems
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Flashed
            </th>
            {canEdit && (
              <th scope="col" className="py-2 pl-3 font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {revisions.map((entry) => (
            <tr
              key={entry.number}
              className={
                pair && (entry.number === pair.from || entry.number === pair.to) ? 'bg-accent-soft/40' : undefined
              }
            >
              <td className="py-2 pr-1">
                <input
                  type="radio"
                  name={`compare-from-${robotId}`}
                  aria-label={`Compare from revision ${entry.number}`}
                  checked={pair?.from === entry.number}
                  onChange={() => onPairChange({ from: entry.number, to: pair?.to ?? headRevision })}
                  className="accent-[var(--color-accent)]"
                />
              </td>
              <td className="py-2 pr-3">
                <input
                  type="radio"
                  name={`compare-to-${robotId}`}
                  aria-label={`Compare to revision ${entry.number}`}
                  checked={pair?.to === entry.number}
                  onChange={() => onPairChange({ from: pair?.from ?? entry.number, to: entry.number })}
                  className="accent-[var(--color-accent)]"
                />
              </td>
              <td className="px-3 py-2 whitespace-nowrap">
                <span className="font-mono">r{entry.number}</span>{' '}
                {entry.number === headRevision && <Badge tone="accent">head</Badge>}
              </td>
              <td className="px-3 py-2">{entry.message}</td>
              <td className="px-3 py-2 whitespace-nowrap text-ink-muted">
                {entry.authorName ?? 'Someone'} ·{' '}
                <time dateTime={entry.createdAt} title={formatDateTime(entry.createdAt)}>
                  {formatAgo(entry.createdAt)}
                </time>
              </td>
              <td className="px-3 py-2 whitespace-nowrap">
                <ProblemCountText problems={entry.problems} />
              </td>
              <td className="px-3 py-2 whitespace-nowrap">
                <FlashedBadge entry={entry} onRobot={onRobot} />
              </td>
              {canEdit && (
                <td className="py-2 pl-3 text-right">
                  {entry.number !== headRevision && (
                    <RestoreAction robotId={robotId} revision={entry.number} headRevision={headRevision} />
                  )}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
