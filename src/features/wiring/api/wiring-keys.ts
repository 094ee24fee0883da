/** Query keys of the wiring feature (the wiring sheet's robot and revision). */
export const wiringKeys = {
  all: ['wiring'] as const,
  robot: (robotId: string) => [...wiringKeys.all, 'robot', robotId] as const,
  revision: (robotId: string, revision: number) => [...wiringKeys.all, 'revision', robotId, revision] as const,
};
