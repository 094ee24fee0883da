import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { FlashEntry } from '@shared/schemas/flash-log';
import { flashLogKeys } from './flash-log-keys';

export async function getFlashLog(robotId: string): Promise<FlashEntry[]> {
  return (await apiRequest<{ flashes: FlashEntry[] }>(`/robots/${encodeURIComponent(robotId)}/flashes`)).flashes;
}

export const flashLogQueryOptions = (robotId: string) =>
  queryOptions({ queryKey: flashLogKeys.list(robotId), queryFn: () => getFlashLog(robotId) });

export function useFlashLog(robotId: string) {
  return useQuery(flashLogQueryOptions(robotId));
}
