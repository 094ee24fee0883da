import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { CreateRobotInput, RobotSummary } from '@shared/schemas/robots';
import { robotKeys } from '@/lib/robot-keys';

export async function createRobot(teamId: string, input: CreateRobotInput): Promise<RobotSummary> {
  const path = `/teams/${encodeURIComponent(teamId)}/robots`;
  return (await apiRequest<{ robot: RobotSummary }>(path, { method: 'POST', body: input })).robot;
}

export function useCreateRobot(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRobotInput) => createRobot(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: robotKeys.team(teamId) }),
  });
}
