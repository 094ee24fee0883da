import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { TeamActivity } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getTeamActivity(teamId: string): Promise<TeamActivity[]> {
  return (await apiRequest<{ events: TeamActivity[] }>(`/teams/${encodeURIComponent(teamId)}/activity`)).events;
}

export const teamActivityQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.activity(teamId), queryFn: () => getTeamActivity(teamId) });

export function useTeamActivity(teamId: string) {
  return useQuery(teamActivityQueryOptions(teamId));
}
