import type { ActivityKind } from '@shared/schemas/activity';

export const activityKeys = {
  all: ['activity'] as const,
  list: (teamId: string, kind: ActivityKind) => [...activityKeys.all, teamId, kind] as const,
};
