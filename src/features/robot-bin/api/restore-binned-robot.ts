import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/lib/robot-keys';
import { apiRequest } from '@/lib/api-client';
import type { RobotSummary } from '@shared/schemas/robots';
import { robotBinKeys } from './robot-bin-keys';

export async function restoreBinnedRobot(teamId: string, robotId: string): Promise<RobotSummary> {
  const path = `/teams/${encodeURIComponent(teamId)}/robot-bin/${encodeURIComponent(robotId)}/restore`;
  return (await apiRequest<{ robot: RobotSummary }>(path, { method: 'POST' })).robot;
}

export function useRestoreBinnedRobot(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (robotId: string) => restoreBinnedRobot(teamId, robotId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: robotBinKeys.list(teamId) }),
        queryClient.invalidateQueries({ queryKey: robotKeys.team(teamId) }),
      ]),
  });
}
