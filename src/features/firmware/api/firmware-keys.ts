import type { RobotConfig } from '@shared/schemas/robot-config';

/** Query keys of the firmware feature; invalidate through these. */
export const firmwareKeys = {
  all: ['firmware'] as const,
  robot: (robotId: string) => [...firmwareKeys.all, robotId] as const,
  files: (robotId: string, revision: number) => [...firmwareKeys.robot(robotId), 'files', revision] as const,
  draftFiles: (robotId: string, config: RobotConfig) =>
    [...firmwareKeys.robot(robotId), 'draft-files', config] as const,
  verify: (robotId: string, revision: number) => [...firmwareKeys.robot(robotId), 'verify', revision] as const,
};
