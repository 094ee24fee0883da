import { useMutation, useQueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/features/robots/api/robot-keys';
import { apiRequest } from '@/lib/api-client';
import type { FlashEntry, RecordFlashInput } from '@shared/schemas/history';
import { historyKeys } from './history-keys';

export async function recordFlash(robotId: string, input: RecordFlashInput): Promise<FlashEntry> {
  return (
    await apiRequest<{ flash: FlashEntry }>(`/robots/${encodeURIComponent(robotId)}/flashes`, {
      method: 'POST',
      body: input,
    })
  ).flash;
}

export function useRecordFlash(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RecordFlashInput) => recordFlash(robotId, input),
    // The dashboard shows the last flash of each robot.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: historyKeys.robot(robotId) }),
        queryClient.invalidateQueries({ queryKey: robotKeys.all }),
      ]),
  });
}
