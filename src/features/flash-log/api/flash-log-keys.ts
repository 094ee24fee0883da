import { robotKeys } from '@/lib/robot-keys';

export const flashLogKeys = {
  list: (robotId: string) => [...robotKeys.detail(robotId), 'flashes'] as const,
};
