import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { BinnedRobot } from '@shared/schemas/robot-bin';
import { robotBinKeys } from './robot-bin-keys';

export async function getRobotBin(teamId: string): Promise<BinnedRobot[]> {
  return (await apiRequest<{ robots: BinnedRobot[] }>(`/teams/${encodeURIComponent(teamId)}/robot-bin`)).robots;
}

export const robotBinQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: robotBinKeys.list(teamId), queryFn: () => getRobotBin(teamId) });

export function useRobotBin(teamId: string, enabled = true) {
  return useQuery({ ...robotBinQueryOptions(teamId), enabled });
}
