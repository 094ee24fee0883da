import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export function revokeInvitation(input: { teamId: string; invitationId: string }): Promise<void> {
  const path = `/teams/${encodeURIComponent(input.teamId)}/invitations/${encodeURIComponent(input.invitationId)}`;
  return apiRequest(path, { method: 'DELETE' });
}

export function useRevokeInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation({ teamId, invitationId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) }),
  });
}
