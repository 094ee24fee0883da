import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { CreateTeamInput, TeamDetail } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function createTeam(input: CreateTeamInput): Promise<TeamDetail> {
  return (await apiRequest<{ team: TeamDetail }>('/teams', { method: 'POST', body: input })).team;
}

export function useCreateTeam() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTeam,
    onSuccess: (team) => {
      queryClient.setQueryData(teamKeys.detail(team.id), team);
      return queryClient.invalidateQueries({ queryKey: teamKeys.list() });
    },
  });
}
