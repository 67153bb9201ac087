// The measured spectra attached to a version, oldest first.
import { measurementSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../core/api/apiFetch.js';
import { measuredPaths } from './measuredPaths.js';
import { measuredQueryKeys } from './measuredQueryKeys.js';

const listSchema = z.array(measurementSchema);

/** Loads GET .../versions/:number/measurements (any member). */
export function useMeasurements(teamId: string, configurationId: string, versionNumber: number) {
  return useQuery({
    queryKey: measuredQueryKeys.list(teamId, configurationId, versionNumber),
    queryFn: ({ signal }) => apiFetch(measuredPaths.list(teamId, configurationId, versionNumber), listSchema, { signal }),
  });
}
