// The JSON bench export of a version: gate states, drive values, total power, cautions and checksum.
import { benchExportSchema, type BenchExportBody } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { ApiResponseError } from '../../core/api/ApiResponseError.js';
import { benchPaths } from './benchPaths.js';
import { benchQueryKeys } from './benchQueryKeys.js';
import { fetchExportText } from './fetchExportText.js';

/** The export as checked by the shared schema, the answer as sent (for the checksum and the download) and its file name. */
export type LoadedBenchExport = { exported: BenchExportBody; raw: unknown; text: string; fileName: string | null };

/**
 * Loads GET .../versions/:number/bench-export (any member). A drive value beyond its limit fails the query with
 * a DriveLimitRequestError listing each shifter; other refusals are ApiRequestErrors.
 */
export function useBenchExport(teamId: string, configurationId: string, versionNumber: number) {
  return useQuery({
    queryKey: benchQueryKeys.benchExport(teamId, configurationId, versionNumber),
    queryFn: async ({ signal }): Promise<LoadedBenchExport> => {
      const path = benchPaths.benchExport(teamId, configurationId, versionNumber);
      const { text, fileName } = await fetchExportText(path, signal);
      let raw: unknown;
      try {
        raw = JSON.parse(text) as unknown;
      } catch {
        throw new ApiResponseError(`GET ${path}`, 'the body is not JSON');
      }
      const parsed = benchExportSchema.safeParse(raw);
      if (!parsed.success) throw new ApiResponseError(`GET ${path}`, parsed.error.message);
      return { exported: parsed.data, raw, text, fileName };
    },
  });
}
