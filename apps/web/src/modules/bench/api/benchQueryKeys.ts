// Query keys of a version's bench export.

/** Key builder of the JSON export of a version. */
export const benchQueryKeys = {
  benchExport: (teamId: string, configurationId: string, versionNumber: number) => ['teams', teamId, 'configurations', configurationId, 'versions', versionNumber, 'bench-export'] as const,
};
