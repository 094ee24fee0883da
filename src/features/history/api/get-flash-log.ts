import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { FlashEntry } from '@shared/schemas/history';
import { historyKeys } from './history-keys';

export async function getFlashLog(robotId: string): Promise<FlashEntry[]> {
  return (await apiRequest<{ flashes: FlashEntry[] }>(`/robots/${encodeURIComponent(robotId)}/flashes`)).flashes;
}

export const flashLogQueryOptions = (robotId: string) =>
  queryOptions({ queryKey: historyKeys.flashes(robotId), queryFn: () => getFlashLog(robotId) });

export function useFlashLog(robotId: string) {
  return useQuery(flashLogQueryOptions(robotId));
}
