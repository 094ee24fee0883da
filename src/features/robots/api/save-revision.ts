import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RevisionDetail, RobotDetail, SaveRevisionInput } from '@shared/schemas/robots';
import { robotKeys } from '@/lib/robot-keys';

export async function saveRevision(robotId: string, input: SaveRevisionInput): Promise<RevisionDetail> {
  const path = `/robots/${encodeURIComponent(robotId)}/revisions`;
  return (await apiRequest<{ revision: RevisionDetail }>(path, { method: 'POST', body: input })).revision;
}

/** Saves a revision; the robot's head moves to it at once, and lists that show it are refreshed. */
export function useSaveRevision(robotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveRevisionInput) => saveRevision(robotId, input),
    onSuccess: (revision) => {
      queryClient.setQueryData<RobotDetail>(robotKeys.detail(robotId), (old) =>
        old
          ? { robot: { ...old.robot, headRevision: revision.number, updatedAt: revision.createdAt }, head: revision }
          : old,
      );
      queryClient.setQueryData(robotKeys.revision(robotId, revision.number), revision);
      void queryClient.invalidateQueries({ queryKey: robotKeys.revisions(robotId), exact: true });
      void queryClient.invalidateQueries({ queryKey: [...robotKeys.all, 'team'] });
    },
  });
}
