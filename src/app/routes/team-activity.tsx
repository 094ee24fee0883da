import { useOutletContext } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { useTeamActivity } from '@/features/teams/api/get-team-activity';
import { ActivityList } from '@/features/teams/components/activity-list';
import { errorMessage } from '@/lib/api-client';
import type { TeamDetail } from '@shared/schemas/teams';

export function TeamActivityRoute() {
  const team = useOutletContext<TeamDetail>();
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
