export const teamKeys = {
  all: ['teams'] as const,
  list: () => [...teamKeys.all, 'list'] as const,
  detail: (teamId: string) => [...teamKeys.all, 'detail', teamId] as const,
  members: (teamId: string) => [...teamKeys.all, 'detail', teamId, 'members'] as const,
  invitations: (teamId: string) => [...teamKeys.all, 'detail', teamId, 'invitations'] as const,
  activity: (teamId: string) => [...teamKeys.all, 'detail', teamId, 'activity'] as const,
  invitationPreview: (token: string) => [...teamKeys.all, 'invitation', token] as const,
};
