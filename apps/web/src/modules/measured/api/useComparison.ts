// Simulated versus measured power of one measurement, with the residual figures.
import { comparisonSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { measuredPaths } from './measuredPaths.js';
import { measuredQueryKeys } from './measuredQueryKeys.js';

/** Loads GET .../measurements/:measurementId/comparison (any member); disabled without a measurement id. */
export function useComparison(teamId: string, configurationId: string, versionNumber: number, measurementId: string | null) {
  return useQuery({
    queryKey: measuredQueryKeys.comparison(teamId, configurationId, versionNumber, measurementId ?? ''),
    enabled: measurementId !== null,
    queryFn: ({ signal }) => apiFetch(measuredPaths.comparison(teamId, configurationId, versionNumber, measurementId ?? ''), comparisonSchema, { signal }),
  });
}
