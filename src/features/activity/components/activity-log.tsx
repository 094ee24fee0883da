import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import { ACTIVITY_KINDS, type ActivityKind } from '@shared/schemas/activity';
import { useTeamActivity } from '../api/get-team-activity';
import { ActivityList } from './activity-list';

const KIND_LABELS: Record<ActivityKind, string> = {
  all: 'Everything',
  'sign-ins': 'Sign-ins',
  people: 'People and roles',
  robots: 'Robots',
  revisions: 'Revisions',
  flashes: 'Flashes',
};

/**
 * The team's activity, filtered by kind, fifty events at a time. Owners also see when members
 * signed in (`withSignIns`); the server shows sign-ins to owners only.
 */
export function ActivityLog({ teamId, withSignIns }: { teamId: string; withSignIns: boolean }) {
  const [kind, setKind] = useState<ActivityKind>('all');
  const log = useTeamActivity(teamId, kind);
  const id = useId();
  const events = log.data?.pages.flatMap((page) => page.events) ?? [];
  const kinds = ACTIVITY_KINDS.filter((k) => withSignIns || k !== 'sign-ins');
  return (
    <div className="space-y-3">
      <label htmlFor={id} className="flex items-center gap-2 text-sm font-semibold text-ink-soft">
        Show
        <select
          id={id}
          value={kind}
          onChange={(e) => setKind(e.target.value as ActivityKind)}
          className="rounded-md border border-rule-strong bg-paper-raised px-2 py-1 font-normal text-ink"
        >
          {kinds.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      {log.isPending && <LoadingState label="Loading activity…" />}
      {log.isError && <ErrorState message={errorMessage(log.error)} onRetry={() => log.refetch()} />}
      {log.isSuccess && events.length === 0 && (
        <EmptyState title={kind === 'all' ? 'Nothing has happened yet' : 'Nothing of this kind yet'} />
      )}
      {events.length > 0 && <ActivityList events={events} />}
      {log.hasNextPage && (
        <Button variant="secondary" size="sm" busy={log.isFetchingNextPage} onClick={() => log.fetchNextPage()}>
          Show older
        </Button>
      )}
    </div>
  );
}
