// The current calibration of a chip, or null when none was uploaded.
import { calibrationSchema, type Calibration } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** Loads GET /api/teams/:teamId/chips/:chipId/calibration (any member); the server's 404 "no calibration yet" becomes null. */
export function useCalibration(teamId: string, chipId: string) {
  return useQuery({
    queryKey: chipQueryKeys.calibration(teamId, chipId),
    enabled: teamId !== '' && chipId !== '',
    queryFn: async ({ signal }): Promise<Calibration | null> => {
      try {
        return await apiFetch(chipPaths(teamId, chipId, 'calibration'), calibrationSchema, { signal });
      } catch (error) {
        if (error instanceof ApiRequestError && error.statusCode === 404) return null;
        throw error;
      }
    },
  });
}
