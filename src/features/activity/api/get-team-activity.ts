import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ActivityKind, ActivityPage } from '@shared/schemas/activity';
import { activityKeys } from './activity-keys';

export function getTeamActivity(teamId: string, kind: ActivityKind, before?: number): Promise<ActivityPage> {
  const query = new URLSearchParams({ kind, limit: '50', ...(before ? { before: String(before) } : {}) });
  return apiRequest<ActivityPage>(`/teams/${encodeURIComponent(teamId)}/activity?${query}`);
}

export const teamActivityQueryOptions = (teamId: string, kind: ActivityKind) =>
  infiniteQueryOptions({
    queryKey: activityKeys.list(teamId, kind),
    queryFn: ({ pageParam }) => getTeamActivity(teamId, kind, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

export function useTeamActivity(teamId: string, kind: ActivityKind) {
  return useInfiniteQuery(teamActivityQueryOptions(teamId, kind));
}
