// API paths of a version's bench exports.

/** The version's base path, `/api/teams/:teamId/configurations/:configurationId/versions/:number`. */
export function versionPath(teamId: string, configurationId: string, versionNumber: number): string {
  return `/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${versionNumber}`;
}

/** Query of the Touchstone route: the two ports (ids or labels) and the span of offsets from the carrier. */
export type TouchstoneRequest = { fromPort: string; toPort: string; startOffsetHz: number; stopOffsetHz: number; points: number };

/** Paths of GET .../bench-export (JSON or CSV) and GET .../touchstone. */
export const benchPaths = {
  benchExport: (teamId: string, configurationId: string, versionNumber: number, format: 'json' | 'csv' = 'json'): string =>
    `${versionPath(teamId, configurationId, versionNumber)}/bench-export${format === 'csv' ? '?format=csv' : ''}`,
  touchstone: (teamId: string, configurationId: string, versionNumber: number, q: TouchstoneRequest): string => {
    // Port ids hold commas, so the ports go as repeated parameters (the route also splits on ";").
    const query = new URLSearchParams([
      ['ports', q.fromPort],
      ['ports', q.toPort],
      ['startOffsetHz', String(q.startOffsetHz)],
      ['stopOffsetHz', String(q.stopOffsetHz)],
      ['points', String(q.points)],
    ]);
    return `${versionPath(teamId, configurationId, versionNumber)}/touchstone?${query.toString()}`;
  },
};
