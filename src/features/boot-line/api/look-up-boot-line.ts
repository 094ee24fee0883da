import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { BootLineAnswer } from '@shared/schemas/boot-line';

export function lookUpBootLine(robotId: string, line: string): Promise<BootLineAnswer> {
  return apiRequest<BootLineAnswer>(`/robots/${encodeURIComponent(robotId)}/boot-line`, {
    method: 'POST',
    body: { line },
  });
}

/** A question, not a change: nothing to refresh afterwards. */
export function useLookUpBootLine(robotId: string) {
  return useMutation({ mutationFn: (line: string) => lookUpBootLine(robotId, line) });
}
