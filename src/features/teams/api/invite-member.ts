import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { InvitationDelivery, InviteMemberInput, PendingInvitation } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export interface CreatedInvitation {
  invitation: PendingInvitation;
  delivery: InvitationDelivery;
  /** The one-time link, when the owner must pass it on by hand (no outgoing mail server). */
  link: string | null;
}

export async function inviteMember(teamId: string, input: InviteMemberInput): Promise<CreatedInvitation> {
  const path = `/teams/${encodeURIComponent(teamId)}/invitations`;
  return apiRequest<CreatedInvitation>(path, { method: 'POST', body: input });
}

export function useInviteMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteMemberInput) => inviteMember(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) }),
  });
}
