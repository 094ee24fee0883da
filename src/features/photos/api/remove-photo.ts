import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/lib/robot-keys';
import { apiRequest } from '@/lib/api-client';

export function removePhoto(robotId: string): Promise<void> {
  return apiRequest<void>(`/robots/${encodeURIComponent(robotId)}/photo`, { method: 'DELETE' });
}

export function useRemovePhoto(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => removePhoto(robotId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: robotKeys.all }),
  });
}
