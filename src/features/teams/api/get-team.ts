import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { TeamDetail } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getTeam(teamId: string): Promise<TeamDetail> {
  return (await apiRequest<{ team: TeamDetail }>(`/teams/${encodeURIComponent(teamId)}`)).team;
}

export const teamQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.detail(teamId), queryFn: () => getTeam(teamId) });

export function useTeam(teamId: string) {
  return useQuery(teamQueryOptions(teamId));
}
