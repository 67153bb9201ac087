// The status of the version shown and of every other version of its configuration, as the server last answered.
import type { ConfigurationVersion, VersionSummary } from '@hexloom/contracts';
import { useConfiguration } from '../../chips/api/useConfiguration.js';

/** What the review panel needs to bind an approval to its version and spot a newer, unapproved one. */
export type VersionStatuses = {
  /** The shown version with its newest known status (the list's, once loaded; else the prop's). */
  current: Pick<VersionSummary, 'number' | 'status' | 'approvedBy' | 'approvedAt'>;
  versions: VersionSummary[];
  error: Error | null;
  refetch: () => void;
};

/** Reads the configuration (shared cache with the workspace) for the statuses of its versions. */
export function useVersionStatuses(teamId: string, configurationId: string, version: ConfigurationVersion): VersionStatuses {
  const configuration = useConfiguration(teamId, configurationId);
  const versions = configuration.data?.versions ?? [];
  const listed = versions.find((v) => v.number === version.number);
  return { current: listed ?? version, versions, error: configuration.error, refetch: () => void configuration.refetch() };
}
