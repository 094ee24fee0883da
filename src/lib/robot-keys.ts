import type { QueryClient } from '@tanstack/react-query';

/**
 * The robot's cache keys. A robot is read by several features (robots, history, flash log,
 * photos, robot files, robot bin), so its keys live here, and each of those features keys its
 * own queries below `robotKeys.detail(robotId)`: invalidating the robot refreshes all of them.
 */
export const robotKeys = {
  all: ['robots'] as const,
  team: (teamId: string) => [...robotKeys.all, 'team', teamId] as const,
  detail: (robotId: string) => [...robotKeys.all, 'detail', robotId] as const,
  revisions: (robotId: string) => [...robotKeys.all, 'detail', robotId, 'revisions'] as const,
  revision: (robotId: string, number: number) => [...robotKeys.all, 'detail', robotId, 'revisions', number] as const,
};

/**
 * After a change the dashboard shows too (a new revision from a restore or an import, a flash,
 * a photo): every robot query, the robot's history and flash log included, is fetched again.
 */
export function refreshRobots(queryClient: QueryClient): Promise<unknown> {
  return queryClient.invalidateQueries({ queryKey: robotKeys.all });
}
