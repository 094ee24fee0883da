import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { InvitationDelivery, PendingInvitation } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export interface TeamInvitations {
  invitations: PendingInvitation[];
  /** `by-hand` when the server has no outgoing mail server and the owner passes links on. */
  delivery: InvitationDelivery;
}

export async function getInvitations(teamId: string): Promise<TeamInvitations> {
  return apiRequest<TeamInvitations>(`/teams/${encodeURIComponent(teamId)}/invitations`);
}

export const invitationsQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.invitations(teamId), queryFn: () => getInvitations(teamId) });

/** Only owners may list invitations; pass `enabled: false` for everyone else. */
export function useInvitations(teamId: string, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(teamId), enabled });
}
