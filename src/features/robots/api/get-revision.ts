import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RevisionDetail } from '@shared/schemas/robots';
import { robotKeys } from '@/lib/robot-keys';

export async function getRevision(robotId: string, number: number): Promise<RevisionDetail> {
  return (await apiRequest<{ revision: RevisionDetail }>(`/robots/${encodeURIComponent(robotId)}/revisions/${number}`))
    .revision;
}

// A saved revision never changes, so it never goes stale.
export const revisionQueryOptions = (robotId: string, number: number) =>
  queryOptions({
    queryKey: robotKeys.revision(robotId, number),
    queryFn: () => getRevision(robotId, number),
    staleTime: Infinity,
  });

export function useRevision(robotId: string, number: number | null) {
  return useQuery({ ...revisionQueryOptions(robotId, number ?? 0), enabled: number !== null });
}
