import { useOutletContext } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { AuditLog } from '@/features/history/components/audit-log';
import { useTeamActivity } from '@/features/teams/api/get-team-activity';
import { ActivityList } from '@/features/teams/components/activity-list';
import { errorMessage } from '@/lib/api-client';
import type { TeamDetail } from '@shared/schemas/teams';

export function TeamActivityRoute() {
  const team = useOutletContext<TeamDetail>();
  return team.role === 'owner' ? <OwnerAuditLog team={team} /> : <RecentActivity team={team} />;
}

/** Owners see the full audit log: sign-ins of members included, filtered, paged. */
function OwnerAuditLog({ team }: { team: TeamDetail }) {
  return (
    <Panel
      title="Audit log"
      titleId="activity-title"
      description="Who did what in this team, and when members signed in; newest first."
    >
      <AuditLog teamId={team.id} renderEvents={(events) => <ActivityList events={events} />} />
    </Panel>
  );
}

function RecentActivity({ team }: { team: TeamDetail }) {
  const activity = useTeamActivity(team.id);
  return (
    <Panel title="Recent activity" titleId="activity-title" description="Who changed what in this team, newest first.">
      {activity.isPending && <LoadingState label="Loading activity…" />}
      {activity.isError && <ErrorState message={errorMessage(activity.error)} onRetry={() => activity.refetch()} />}
      {activity.data && activity.data.length === 0 && <EmptyState title="Nothing has happened yet" />}
      {activity.data && activity.data.length > 0 && <ActivityList events={activity.data} />}
    </Panel>
  );
}
