import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { Role } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export function acceptInvitation(token: string): Promise<{ teamId: string; role: Role }> {
  return apiRequest(`/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST' });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // The invitation's own preview is left alone: asked again now it would answer "already used".
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
