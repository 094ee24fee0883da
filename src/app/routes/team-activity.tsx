import { useOutletContext } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { ActivityLog } from '@/features/activity/components/activity-log';
import type { TeamDetail } from '@shared/schemas/teams';

export function TeamActivityRoute() {
  const team = useOutletContext<TeamDetail>();
  const owner = team.role === 'owner';
  return (
    <Panel
      title="Activity"
      titleId="activity-title"
      description={
        owner
          ? 'Who did what in this team, and when members signed in; newest first.'
          : 'Who changed what in this team, newest first.'
      }
    >
      <ActivityLog teamId={team.id} withSignIns={owner} />
    </Panel>
  );
}
