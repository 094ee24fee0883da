export const robotBinKeys = {
  list: (teamId: string) => ['robot-bin', teamId] as const,
};
