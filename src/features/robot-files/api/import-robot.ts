import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/lib/robot-keys';
import { apiRequest } from '@/lib/api-client';
import type { ImportAnswer } from '@shared/schemas/robot-files';
import type { RobotSummary } from '@shared/schemas/robots';

export interface ImportRobotInput {
  file: File;
  name?: string;
  message?: string;
}

export type ImportRobotAnswer = ImportAnswer & { robot: RobotSummary };

export function importRobot(teamId: string, input: ImportRobotInput): Promise<ImportRobotAnswer> {
  const form = new FormData();
  if (input.name) form.set('name', input.name);
  if (input.message) form.set('message', input.message);
  form.set('file', input.file);
  return apiRequest<ImportRobotAnswer>(`/teams/${encodeURIComponent(teamId)}/robots/import`, {
    method: 'POST',
    body: form,
  });
}

export function useImportRobot(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ImportRobotInput) => importRobot(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: robotKeys.team(teamId) }),
  });
}
