import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RevisionDetail } from '@shared/schemas/robots';
import { wiringKeys } from './wiring-keys';

/** One saved revision of a robot (GET /api/robots/:robotId/revisions/:revision). */
export async function getSheetRevision(robotId: string, revision: number): Promise<RevisionDetail> {
  return (
    await apiRequest<{ revision: RevisionDetail }>(`/robots/${encodeURIComponent(robotId)}/revisions/${revision}`)
  ).revision;
}

export const sheetRevisionQueryOptions = (robotId: string, revision: number) =>
  queryOptions({
    queryKey: wiringKeys.revision(robotId, revision),
    queryFn: () => getSheetRevision(robotId, revision),
    staleTime: Infinity,
  });

/** A saved revision never changes, so it is fetched once; `revision` null skips the request. */
export function useSheetRevision(robotId: string, revision: number | null) {
  return useQuery({ ...sheetRevisionQueryOptions(robotId, revision ?? 0), enabled: revision !== null });
}
