export const teamKeys = {
  all: ['teams'] as const,
  list: () => [...teamKeys.all, 'list'] as const,
  detail: (teamId: string) => [...teamKeys.all, 'detail', teamId] as const,
  members: (teamId: string) => [...teamKeys.all, 'detail', teamId, 'members'] as const,
  invitations: (teamId: string) => [...teamKeys.all, 'detail', teamId, 'invitations'] as const,
  /** Outside `all` on purpose: refreshing teams after accepting must not re-read a used invitation. */
  invitationPreview: (token: string) => ['invitation-preview', token] as const,
};
