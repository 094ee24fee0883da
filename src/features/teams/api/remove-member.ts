import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export function removeMember(input: { teamId: string; userId: string }): Promise<void> {
  const path = `/teams/${encodeURIComponent(input.teamId)}/members/${encodeURIComponent(input.userId)}`;
  return apiRequest(path, { method: 'DELETE' });
}

export function useRemoveMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember({ teamId, userId }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: teamKeys.detail(teamId) }),
        queryClient.invalidateQueries({ queryKey: teamKeys.list() }),
      ]),
  });
}
