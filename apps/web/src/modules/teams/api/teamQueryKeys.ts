// Query keys of team data, so mutations invalidate exactly what they change.

/** Query key builders for one team's members and invitations. */
export const teamQueryKeys = {
  members: (teamId: string) => ['teams', teamId, 'members'] as const,
  invitations: (teamId: string) => ['teams', teamId, 'invitations'] as const,
};
