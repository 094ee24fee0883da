import { Link } from 'react-router';
import { Badge } from '@/components/ui/badge';
import type { TeamSummary } from '@shared/schemas/teams';

export function TeamList({ teams }: { teams: TeamSummary[] }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {teams.map((team) => (
        <li key={team.id}>
          <Link
            to={`/teams/${team.id}`}
            className="group flex h-full flex-col gap-2 rounded-lg border border-rule bg-paper-raised px-5 py-4 shadow-[0_1px_2px_rgba(29,42,68,0.06)] transition-colors hover:border-accent/60"
          >
            <span className="flex items-center justify-between gap-3">
              <span className="text-lg font-semibold text-ink group-hover:text-accent-strong">{team.name}</span>
              <Badge tone={team.role === 'owner' ? 'accent' : 'neutral'}>{team.role}</Badge>
            </span>
            <span className="text-sm text-ink-muted">
              <span className="font-mono text-ink-soft">{team.robotCount}</span>{' '}
              {team.robotCount === 1 ? 'robot' : 'robots'} ·{' '}
              <span className="font-mono text-ink-soft">{team.memberCount}</span>{' '}
              {team.memberCount === 1 ? 'member' : 'members'}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
