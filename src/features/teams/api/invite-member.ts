import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { InviteMemberInput, PendingInvitation } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function inviteMember(teamId: string, input: InviteMemberInput): Promise<PendingInvitation> {
  const path = `/teams/${encodeURIComponent(teamId)}/invitations`;
  return (await apiRequest<{ invitation: PendingInvitation }>(path, { method: 'POST', body: input })).invitation;
}

export function useInviteMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteMemberInput) => inviteMember(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) }),
  });
}
