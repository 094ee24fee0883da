import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RobotDetail } from '@shared/schemas/robots';
import { wiringKeys } from './wiring-keys';

/** The robot with its head revision (GET /api/robots/:robotId). */
export async function getSheetRobot(robotId: string): Promise<RobotDetail> {
  return apiRequest<RobotDetail>(`/robots/${encodeURIComponent(robotId)}`);
}

export const sheetRobotQueryOptions = (robotId: string) =>
  queryOptions({ queryKey: wiringKeys.robot(robotId), queryFn: () => getSheetRobot(robotId) });

export function useSheetRobot(robotId: string) {
  return useQuery(sheetRobotQueryOptions(robotId));
}
