import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { PendingInvitation } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getInvitations(teamId: string): Promise<PendingInvitation[]> {
  return (await apiRequest<{ invitations: PendingInvitation[] }>(`/teams/${encodeURIComponent(teamId)}/invitations`))
    .invitations;
}

export const invitationsQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.invitations(teamId), queryFn: () => getInvitations(teamId) });

/** Only owners may list invitations; pass `enabled: false` for everyone else. */
export function useInvitations(teamId: string, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(teamId), enabled });
}
