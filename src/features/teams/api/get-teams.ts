import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { TeamSummary } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getTeams(): Promise<TeamSummary[]> {
  return (await apiRequest<{ teams: TeamSummary[] }>('/teams')).teams;
}

export const teamsQueryOptions = () => queryOptions({ queryKey: teamKeys.list(), queryFn: getTeams });

export function useTeams() {
  return useQuery(teamsQueryOptions());
}
