import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/lib/robot-keys';
import { apiRequest } from '@/lib/api-client';
import { robotBinKeys } from './robot-bin-keys';

export function deleteRobot(robotId: string): Promise<void> {
  return apiRequest<void>(`/robots/${encodeURIComponent(robotId)}`, { method: 'DELETE' });
}

export function useDeleteRobot(robotId: string, teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteRobot(robotId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: robotKeys.team(teamId) }),
        queryClient.invalidateQueries({ queryKey: robotBinKeys.list(teamId) }),
      ]),
  });
}
