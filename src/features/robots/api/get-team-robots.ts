import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RobotListItem } from '@shared/schemas/robots';
import { robotKeys } from '@/lib/robot-keys';

export async function getTeamRobots(teamId: string): Promise<RobotListItem[]> {
  return (await apiRequest<{ robots: RobotListItem[] }>(`/teams/${encodeURIComponent(teamId)}/robots`)).robots;
}

export const teamRobotsQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: robotKeys.team(teamId), queryFn: () => getTeamRobots(teamId) });

export function useTeamRobots(teamId: string) {
  return useQuery(teamRobotsQueryOptions(teamId));
}
