import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { InvitationPreview } from '@shared/schemas/teams';
import { teamKeys } from './team-keys';

export async function getInvitationPreview(token: string): Promise<InvitationPreview> {
  return (await apiRequest<{ invitation: InvitationPreview }>(`/invitations/${encodeURIComponent(token)}`)).invitation;
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: teamKeys.invitationPreview(token),
    queryFn: () => getInvitationPreview(token),
    retry: false,
  });

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
