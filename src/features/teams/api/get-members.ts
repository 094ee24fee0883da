import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { TeamMember } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getMembers(teamId: string): Promise<TeamMember[]> {
  return (await apiRequest<{ members: TeamMember[] }>(`/teams/${encodeURIComponent(teamId)}/members`)).members;
}

export const membersQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.members(teamId), queryFn: () => getMembers(teamId) });

export function useMembers(teamId: string) {
  return useQuery(membersQueryOptions(teamId));
}
