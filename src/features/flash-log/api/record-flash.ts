import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { refreshRobots } from '@/lib/robot-keys';
import type { FlashEntry, RecordFlashInput } from '@shared/schemas/flash-log';

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
    // The history and the dashboard show the last flash of each robot.
    onSuccess: () => refreshRobots(queryClient),
  });
}
