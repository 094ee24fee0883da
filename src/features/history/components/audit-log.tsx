import { useId, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import { AUDIT_KINDS, type AuditKind } from '@shared/schemas/history';
import type { TeamActivity } from '@shared/schemas/teams';
import { useAuditLog } from '../api/get-audit-log';

const KIND_LABELS: Record<AuditKind, string> = {
  all: 'Everything',
  'sign-ins': 'Sign-ins',
  people: 'People and roles',
  robots: 'Robots',
  revisions: 'Revisions',
  flashes: 'Flashes',
};

/**
 * The owners' audit log: every action in the team and the members' sign-ins, filtered by kind,
 * fifty at a time. `renderEvents` draws a page of events (the team feature's activity list).
 */
export function AuditLog({
  teamId,
  renderEvents,
}: {
  teamId: string;
  renderEvents: (events: TeamActivity[]) => ReactNode;
}) {
  const [kind, setKind] = useState<AuditKind>('all');
  const log = useAuditLog(teamId, kind);
  const id = useId();
  const events = log.data?.pages.flatMap((page) => page.events) ?? [];
  return (
    <div className="space-y-3">
      <label htmlFor={id} className="flex items-center gap-2 text-sm font-semibold text-ink-soft">
        Show
        <select
          id={id}
          value={kind}
          onChange={(e) => setKind(e.target.value as AuditKind)}
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1 font-normal text-ink"
        >
          {AUDIT_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      {log.isPending && <LoadingState label="Loading the audit log…" />}
      {log.isError && <ErrorState message={errorMessage(log.error)} onRetry={() => log.refetch()} />}
      {log.isSuccess && events.length === 0 && <EmptyState title="Nothing of this kind yet" />}
      {events.length > 0 && renderEvents(events)}
      {log.hasNextPage && (
        <Button variant="secondary" size="sm" busy={log.isFetchingNextPage} onClick={() => log.fetchNextPage()}>
          Show older
        </Button>
      )}
    </div>
  );
}
