import { useNavigate } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { PageHeader } from '@/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { useTeams } from '@/features/teams/api/get-teams';
import { CreateTeamForm } from '@/features/teams/components/create-team-form';
import { TeamList } from '@/features/teams/components/team-list';
import { errorMessage } from '@/lib/api-client';

export function TeamsRoute() {
  const teams = useTeams();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="Your teams"
        description="Robots belong to teams. Everyone in a team sees its robots; roles decide who may change them."
      />
      <div className="grid items-start gap-6 lg:grid-cols-[1fr_22rem]">
        <div>
          {teams.isPending && <LoadingState label="Loading your teams…" />}
          {teams.isError && <ErrorState message={errorMessage(teams.error)} onRetry={() => teams.refetch()} />}
          {teams.data && teams.data.length === 0 && (
            <EmptyState title="You are not in a team yet">
              Create one, or open the invitation link someone sent you.
            </EmptyState>
          )}
          {teams.data && teams.data.length > 0 && <TeamList teams={teams.data} />}
        </div>
        <Panel title="New team" titleId="new-team-title">
          <CreateTeamForm onCreated={(team) => navigate(`/teams/${team.id}`)} />
        </Panel>
      </div>
    </>
  );
}
