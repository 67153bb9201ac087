// Query keys of version diffs and of the reviews waiting for the signed-in member.

/** Query key builders; they sit under the team's key so a team-wide invalidation reaches them. */
export const versionQueryKeys = {
  diff: (teamId: string, configurationId: string, from: number, to: number) => ['teams', teamId, 'configurations', configurationId, 'diff', from, to] as const,
  waitingReviews: (teamId: string) => ['teams', teamId, 'reviews', 'waiting'] as const,
};
