import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RevisionDiff } from '@shared/schemas/history';
import { historyKeys } from './history-keys';

export function getRevisionDiff(robotId: string, from: number, to: number): Promise<RevisionDiff> {
  return apiRequest<RevisionDiff>(`/robots/${encodeURIComponent(robotId)}/diff?from=${from}&to=${to}`);
}

// Revisions never change, so a diff between two of them never goes stale.
export const revisionDiffQueryOptions = (robotId: string, from: number, to: number) =>
  queryOptions({
    queryKey: historyKeys.diff(robotId, from, to),
    queryFn: () => getRevisionDiff(robotId, from, to),
    staleTime: Infinity,
  });

export function useRevisionDiff(robotId: string, pair: { from: number; to: number } | null) {
  return useQuery({ ...revisionDiffQueryOptions(robotId, pair?.from ?? 0, pair?.to ?? 0), enabled: pair !== null });
}
