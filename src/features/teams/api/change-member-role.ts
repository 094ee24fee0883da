import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { Role, TeamMember } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function changeMemberRole(input: { teamId: string; userId: string; role: Role }): Promise<TeamMember[]> {
  const path = `/teams/${encodeURIComponent(input.teamId)}/members/${encodeURIComponent(input.userId)}`;
  return (await apiRequest<{ members: TeamMember[] }>(path, { method: 'PATCH', body: { role: input.role } })).members;
}

export function useChangeMemberRole(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { userId: string; role: Role }) => changeMemberRole({ teamId, ...input }),
    onSuccess: (members) => {
      queryClient.setQueryData(teamKeys.members(teamId), members);
      // My own role may have changed.
      return queryClient.invalidateQueries({ queryKey: teamKeys.detail(teamId) });
    },
  });
}
