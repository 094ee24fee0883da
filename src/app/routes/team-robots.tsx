import { useOutletContext } from 'react-router';
import { Cautions } from '@/components/ui/cautions';
import { Panel } from '@/components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { DeletedRobotsPanel } from '@/features/history/components/robot-bin-panel';
import { ImportRobotDialog } from '@/features/history/components/import-robot-dialog';
import { useTeamRobots } from '@/features/robots/api/get-team-robots';
import { RobotTable } from '@/features/robots/components/robot-table';
import { errorMessage } from '@/lib/api-client';
import type { TeamDetail } from '@shared/schemas/teams';

/** The team dashboard: its robots, and the cautions everyone sees before driving one. */
export function TeamRobotsRoute() {
  const team = useOutletContext<TeamDetail>();
  const robots = useTeamRobots(team.id);
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[1fr_20rem]">
      <div className="grid gap-6">
        <Panel
          title="Robots"
          titleId="robots-title"
          description="Each robot keeps numbered revisions of its configuration."
          actions={team.role !== 'viewer' && <ImportRobotDialog teamId={team.id} />}
        >
          {robots.isPending && <LoadingState label="Loading robots…" />}
          {robots.isError && <ErrorState message={errorMessage(robots.error)} onRetry={() => robots.refetch()} />}
          {robots.data && robots.data.length === 0 && (
            <EmptyState title="No robots in this team yet">
              {team.role === 'viewer' ? 'Editors and owners add robots.' : 'Robots you add appear here with their revisions.'}
            </EmptyState>
          )}
          {robots.data && robots.data.length > 0 && <RobotTable robots={robots.data} teamName={team.name} />}
        </Panel>
        {team.role === 'owner' && <DeletedRobotsPanel teamId={team.id} />}
      </div>
      <Cautions />
    </div>
  );
}
