import { robotKeys } from '@/lib/robot-keys';

export const historyKeys = {
  list: (robotId: string) => [...robotKeys.detail(robotId), 'history'] as const,
  diff: (robotId: string, from: number, to: number) => [...robotKeys.detail(robotId), 'diff', from, to] as const,
};
