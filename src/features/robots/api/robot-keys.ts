export const robotKeys = {
  all: ['robots'] as const,
  team: (teamId: string) => [...robotKeys.all, 'team', teamId] as const,
  detail: (robotId: string) => [...robotKeys.all, 'detail', robotId] as const,
};
