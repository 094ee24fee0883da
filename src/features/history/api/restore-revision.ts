import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest, isApiError } from '@/lib/api-client';
import type { RevisionDetail } from '@shared/schemas/robots';
import { refreshRobots } from '@/lib/robot-keys';

export interface RestoreRevisionInput {
  robotId: string;
  revision: number;
  baseRevision: number;
  note?: string;
}

export async function restoreRevision({ robotId, revision, ...body }: RestoreRevisionInput): Promise<RevisionDetail> {
  const path = `/robots/${encodeURIComponent(robotId)}/revisions/${revision}/restore`;
  return (await apiRequest<{ revision: RevisionDetail }>(path, { method: 'POST', body })).revision;
}

export function useRestoreRevision(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Omit<RestoreRevisionInput, 'robotId'>) => restoreRevision({ robotId, ...input }),
    onSuccess: () => refreshRobots(queryClient),
    // Someone saved meanwhile: show the newer head so the person can decide again.
    onError: (error) => (isApiError(error, 409) ? refreshRobots(queryClient) : undefined),
  });
}
