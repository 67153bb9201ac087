// API paths of the review and comment routes of one version.

/** `/api/teams/:teamId/configurations/:configurationId/versions/:number/<sub>`. */
export function reviewPath(teamId: string, configurationId: string, number: number, sub: 'reviews' | 'decision' | 'comments' | `comments/${string}`): string {
  return `/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${number}/${sub}`;
}
