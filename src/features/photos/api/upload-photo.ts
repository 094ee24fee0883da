import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/lib/robot-keys';
import { apiRequest } from '@/lib/api-client';
import type { RobotSummary } from '@shared/schemas/robots';

export async function uploadPhoto(robotId: string, file: File): Promise<RobotSummary> {
  const form = new FormData();
  form.set('photo', file);
  return (
    await apiRequest<{ robot: RobotSummary }>(`/robots/${encodeURIComponent(robotId)}/photo`, {
      method: 'PUT',
      body: form,
    })
  ).robot;
}

export function useUploadPhoto(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadPhoto(robotId, file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: robotKeys.all }),
  });
}
