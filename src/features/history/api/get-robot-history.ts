import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RobotHistory } from '@shared/schemas/history';
import { historyKeys } from './history-keys';

export function getRobotHistory(robotId: string): Promise<RobotHistory> {
  return apiRequest<RobotHistory>(`/robots/${encodeURIComponent(robotId)}/history`);
}

export const robotHistoryQueryOptions = (robotId: string) =>
  queryOptions({ queryKey: historyKeys.list(robotId), queryFn: () => getRobotHistory(robotId) });

export function useRobotHistory(robotId: string) {
  return useQuery(robotHistoryQueryOptions(robotId));
}
