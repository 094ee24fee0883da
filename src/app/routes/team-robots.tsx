import { lazy, Suspense, useState } from 'react';
import { useNavigate, useOutletContext } from 'react-router';
import { Button } from '@/components/ui/button';
import { Cautions } from '@/components/ui/cautions';
import { Dialog } from '@/components/ui/dialog';
import { Panel } from '@/components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { DeletedRobotsPanel } from '@/features/robot-bin/components/robot-bin-panel';
import { ImportRobotDialog } from '@/features/robot-files/components/import-robot-dialog';
import { useTeamRobots } from '@/features/robots/api/get-team-robots';
import { RobotTable } from '@/features/robots/components/robot-table';
import { WhichRobotPanel } from '@/features/boot-line/components/which-robot-panel';
import { errorMessage } from '@/lib/api-client';
import type { TeamDetail } from '@shared/schemas/teams';

// The form carries the starter layouts and the pin plan: loaded when someone opens it.
const NewRobotForm = lazy(async () => ({
  default: (await import('@/features/robots/components/new-robot-form')).NewRobotForm,
}));

/** The team dashboard: its robots, which one a boot line belongs to, and the cautions everyone sees before driving one. */
export function TeamRobotsRoute() {
  const team = useOutletContext<TeamDetail>();
  const robots = useTeamRobots(team.id);
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const canEdit = team.role !== 'viewer';
  return (
    <div className="grid items-start gap-6 xl:grid-cols-[1fr_18rem]">
      <div className="grid gap-6">
        <Panel
          title="Robots"
          titleId="robots-title"
          description="Each robot keeps numbered revisions of its configuration."
          actions={
            canEdit && (
              <div className="flex flex-wrap gap-2">
                <ImportRobotDialog teamId={team.id} />
                <Button onClick={() => setCreating(true)}>New robot</Button>
              </div>
            )
          }
        >
          {robots.isPending && <LoadingState label="Loading robots…" />}
          {robots.isError && <ErrorState message={errorMessage(robots.error)} onRetry={() => robots.refetch()} />}
          {robots.data && robots.data.length === 0 && (
            <EmptyState title="No robots in this team yet">
              {canEdit
                ? 'Start one from a starter layout with “New robot”, or import a saved file.'
                : 'Editors and owners add robots.'}
            </EmptyState>
          )}
          {robots.data && robots.data.length > 0 && <RobotTable robots={robots.data} teamName={team.name} />}
        </Panel>
        {team.role === 'owner' && <DeletedRobotsPanel teamId={team.id} />}
      </div>
      <div className="grid gap-6">
        <WhichRobotPanel teamId={team.id} />
        <Cautions />
      </div>
      <Dialog
        open={creating}
        onClose={() => setCreating(false)}
        title="New robot"
        size="max-w-2xl"
        description="Pick a starter layout and the parts; everything can be changed later in the editor."
      >
        <Suspense fallback={<LoadingState label="Loading the starter layouts…" />}>
          <NewRobotForm
            teamId={team.id}
            onCancel={() => setCreating(false)}
            onCreated={(robot) => {
              setCreating(false);
              navigate(`robots/${robot.id}`);
            }}
          />
        </Suspense>
      </Dialog>
    </div>
  );
}
