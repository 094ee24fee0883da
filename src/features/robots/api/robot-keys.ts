export const robotKeys = {
  all: ['robots'] as const,
  team: (teamId: string) => [...robotKeys.all, 'team', teamId] as const,
  /** The team-wide boot-line question (a mutation: asked, not cached). */
  teamBootLine: (teamId: string) => [...robotKeys.all, 'team', teamId, 'boot-line'] as const,
  detail: (robotId: string) => [...robotKeys.all, 'detail', robotId] as const,
  revisions: (robotId: string) => [...robotKeys.all, 'detail', robotId, 'revisions'] as const,
  revision: (robotId: string, number: number) => [...robotKeys.all, 'detail', robotId, 'revisions', number] as const,
};
