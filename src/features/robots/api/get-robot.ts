import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RobotDetail } from '@shared/schemas/robots';
import { robotKeys } from '@/lib/robot-keys';

export async function getRobot(robotId: string): Promise<RobotDetail> {
  return apiRequest<RobotDetail>(`/robots/${encodeURIComponent(robotId)}`);
}

export const robotQueryOptions = (robotId: string) =>
  queryOptions({ queryKey: robotKeys.detail(robotId), queryFn: () => getRobot(robotId) });

export function useRobot(robotId: string) {
  return useQuery(robotQueryOptions(robotId));
}
