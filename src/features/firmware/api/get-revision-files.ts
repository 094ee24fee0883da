import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { FirmwareFiles } from '@shared/schemas/firmware';
import { firmwareKeys } from './firmware-keys';

export function getRevisionFiles(robotId: string, revision: number, signal?: AbortSignal): Promise<FirmwareFiles> {
  return apiRequest<FirmwareFiles>(`/robots/${encodeURIComponent(robotId)}/revisions/${revision}/files`, { signal });
}

/** A saved revision's files never change, so they are fetched once. */
export const revisionFilesQueryOptions = (robotId: string, revision: number) =>
  queryOptions({
    queryKey: firmwareKeys.files(robotId, revision),
    queryFn: ({ signal }) => getRevisionFiles(robotId, revision, signal),
    staleTime: Infinity,
  });

export function useRevisionFiles(robotId: string, revision: number, enabled = true) {
  return useQuery({ ...revisionFilesQueryOptions(robotId, revision), enabled });
}
