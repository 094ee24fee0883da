import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ImportAnswer } from '@shared/schemas/robot-files';
import { refreshRobots } from '@/lib/robot-keys';

export interface ImportRevisionInput {
  file: File;
  baseRevision: number;
  message?: string;
}

export function importRevision(robotId: string, input: ImportRevisionInput): Promise<ImportAnswer> {
  const form = new FormData();
  form.set('baseRevision', String(input.baseRevision));
  if (input.message) form.set('message', input.message);
  form.set('file', input.file);
  return apiRequest<ImportAnswer>(`/robots/${encodeURIComponent(robotId)}/revisions/import`, {
    method: 'POST',
    body: form,
  });
}

export function useImportRevision(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ImportRevisionInput) => importRevision(robotId, input),
    onSuccess: () => refreshRobots(queryClient),
  });
}
