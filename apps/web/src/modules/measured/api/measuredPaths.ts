// API paths of the measured spectra attached to a version.
import { versionPath } from '../../bench/api/benchPaths.js';

/** `.../versions/:number/measurements`, or one measurement's comparison with the simulation. */
export const measuredPaths = {
  list: (teamId: string, configurationId: string, versionNumber: number): string => `${versionPath(teamId, configurationId, versionNumber)}/measurements`,
  comparison: (teamId: string, configurationId: string, versionNumber: number, measurementId: string): string =>
    `${versionPath(teamId, configurationId, versionNumber)}/measurements/${encodeURIComponent(measurementId)}/comparison`,
};
