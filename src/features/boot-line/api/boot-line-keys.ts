export const bootLineKeys = {
  /** The team-wide boot-line question (a mutation: asked, not cached). */
  team: (teamId: string) => ['boot-line', 'team', teamId] as const,
};
