import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AuditKind } from '@shared/schemas/history';
import type { TeamActivity } from '@shared/schemas/teams';
import { historyKeys } from './history-keys';

export interface AuditPage {
  events: TeamActivity[];
  nextBefore: number | null;
}

export function getAuditLog(teamId: string, kind: AuditKind, before?: number): Promise<AuditPage> {
  const query = new URLSearchParams({ kind, limit: '50', ...(before ? { before: String(before) } : {}) });
  return apiRequest<AuditPage>(`/teams/${encodeURIComponent(teamId)}/audit?${query}`);
}

export const auditLogQueryOptions = (teamId: string, kind: AuditKind) =>
  infiniteQueryOptions({
    queryKey: historyKeys.audit(teamId, kind),
    queryFn: ({ pageParam }) => getAuditLog(teamId, kind, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

export function useAuditLog(teamId: string, kind: AuditKind) {
  return useInfiniteQuery(auditLogQueryOptions(teamId, kind));
}
