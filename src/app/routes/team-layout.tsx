import { NavLink, Outlet, useParams } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { ButtonLink } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { PageHeader } from '@/components/ui/page-header';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { useTeam } from '@/features/teams/api/get-team';
import { errorMessage, isApiError } from '@/lib/api-client';
import { ROLE_SUMMARIES } from '@shared/schemas/teams';

const tabs = [
  { to: '', label: 'Robots', end: true },
  { to: 'people', label: 'People', end: false },
  { to: 'activity', label: 'Activity', end: false },
];

export function TeamLayout() {
  const { teamId = '' } = useParams();
  const team = useTeam(teamId);

  if (team.isPending) return <LoadingState label="Loading the team…" />;
  if (team.isError) {
    if (isApiError(team.error, 404)) {
      return (
        <div className="flex flex-col items-start gap-4">
          <PageHeader title="Team not found" description="It does not exist, or you are not a member of it." />
          <ButtonLink to="/teams" variant="secondary">
            Back to your teams
          </ButtonLink>
        </div>
      );
    }
    return <ErrorState message={errorMessage(team.error)} onRetry={() => team.refetch()} />;
  }

  return (
    <>
      <PageHeader
        eyebrow="Team"
        title={team.data.name}
        actions={
          <span className="flex items-center gap-2 text-sm text-ink-muted" title={ROLE_SUMMARIES[team.data.role]}>
            Your role <Badge tone={team.data.role === 'owner' ? 'accent' : 'neutral'}>{team.data.role}</Badge>
          </span>
        }
      />
      <nav aria-label="Team sections" className="mb-6 flex gap-1 border-b border-rule">
        {tabs.map((tab) => (
          <NavLink
            key={tab.label}
            to={tab.to}
            end={tab.end}
            className={({ isActive }) =>
              cx(
                '-mb-px border-b-2 px-3 py-2 text-[0.95rem] font-semibold',
                isActive ? 'border-accent text-accent-strong' : 'border-transparent text-ink-muted hover:text-ink',
              )
            }
          >
            {tab.label}
          </NavLink>
        ))}
      </nav>
      <Outlet context={team.data} />
    </>
  );
}
