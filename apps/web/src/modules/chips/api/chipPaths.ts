// API paths of a team's chips.

/** `/api/teams/:teamId/chips`, or one chip's path with `chipId`, or a sub-path of it. */
export function chipPaths(teamId: string, chipId?: string, sub?: 'calibration' | 'import'): string {
  const base = `/api/teams/${encodeURIComponent(teamId)}/chips`;
  if (sub === 'import') return `${base}/import`;
  const chip = chipId === undefined ? base : `${base}/${encodeURIComponent(chipId)}`;
  return sub ? `${chip}/${sub}` : chip;
}
