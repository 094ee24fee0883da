import type { QueryClient } from '@tanstack/react-query';
import { robotKeys } from '@/features/robots/api/robot-keys';
import { historyKeys } from './history-keys';

/**
 * After a new revision (restore, import) the robot's head changed: the history here and the
 * robot queries the editor and dashboard read must be fetched again.
 */
export function refreshRobot(queryClient: QueryClient, robotId: string): Promise<unknown> {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: historyKeys.robot(robotId) }),
    queryClient.invalidateQueries({ queryKey: robotKeys.all }),
  ]);
}
