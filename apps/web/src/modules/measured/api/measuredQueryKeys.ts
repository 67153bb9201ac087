// Query keys of a version's measurements and their comparisons.

/** Key builders: the list of a version, and one measurement's comparison. */
export const measuredQueryKeys = {
  list: (teamId: string, configurationId: string, versionNumber: number) => ['teams', teamId, 'configurations', configurationId, 'versions', versionNumber, 'measurements'] as const,
  comparison: (teamId: string, configurationId: string, versionNumber: number, measurementId: string) =>
    ['teams', teamId, 'configurations', configurationId, 'versions', versionNumber, 'measurements', measurementId, 'comparison'] as const,
};
