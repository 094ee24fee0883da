import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { BinnedRobot } from '@shared/schemas/history';
import { historyKeys } from './history-keys';

export async function getRobotBin(teamId: string): Promise<BinnedRobot[]> {
  return (await apiRequest<{ robots: BinnedRobot[] }>(`/teams/${encodeURIComponent(teamId)}/robot-bin`)).robots;
}

export const robotBinQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: historyKeys.bin(teamId), queryFn: () => getRobotBin(teamId) });

export function useRobotBin(teamId: string, enabled = true) {
  return useQuery({ ...robotBinQueryOptions(teamId), enabled });
}
