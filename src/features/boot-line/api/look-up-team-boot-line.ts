import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { BootLineInput, TeamBootLineAnswer } from '@shared/schemas/boot-line';
import { bootLineKeys } from './boot-line-keys';

export function lookUpTeamBootLine(teamId: string, input: BootLineInput): Promise<TeamBootLineAnswer> {
  return apiRequest<TeamBootLineAnswer>(`/teams/${encodeURIComponent(teamId)}/boot-line`, {
    method: 'POST',
    body: input,
  });
}

/** A question, not a change: nothing to refresh afterwards. */
export function useLookUpTeamBootLine(teamId: string) {
  return useMutation({
    mutationKey: bootLineKeys.team(teamId),
    mutationFn: (input: BootLineInput) => lookUpTeamBootLine(teamId, input),
  });
}
