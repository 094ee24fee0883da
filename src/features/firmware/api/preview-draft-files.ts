import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { FirmwareFiles } from '@shared/schemas/firmware';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { firmwareKeys } from './firmware-keys';

/** Renders an unsaved draft on the server (a POST: the draft travels in the body; nothing is stored). */
export function previewDraftFiles(robotId: string, config: RobotConfig, signal?: AbortSignal): Promise<FirmwareFiles> {
  return apiRequest<FirmwareFiles>(`/robots/${encodeURIComponent(robotId)}/preview-files`, {
    method: 'POST',
    body: { config },
    signal,
  });
}

export const draftFilesQueryOptions = (robotId: string, config: RobotConfig) =>
  queryOptions({
    queryKey: firmwareKeys.draftFiles(robotId, config),
    queryFn: ({ signal }) => previewDraftFiles(robotId, config, signal),
    staleTime: Infinity,
    gcTime: 60_000,
  });

/** The draft's files; while a newer draft renders, the last files stay on screen. */
export function useDraftFiles(robotId: string, config: RobotConfig, enabled = true) {
  return useQuery({ ...draftFilesQueryOptions(robotId, config), enabled, placeholderData: keepPreviousData });
}
