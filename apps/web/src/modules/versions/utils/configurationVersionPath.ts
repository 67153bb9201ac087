// The path of a configuration opened at one version ("/t/:teamSlug/configurations/:id?v=N").
import { configurationPath } from '../../../routes.js';

/** The configuration's path (from routes.ts) with the version in the `v` query parameter the workspace reads. */
export function configurationVersionPath(teamSlug: string, configurationId: string, versionNumber: number): string {
  return `${configurationPath(teamSlug, configurationId)}?v=${versionNumber}`;
}
