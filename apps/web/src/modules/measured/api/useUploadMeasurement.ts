// Attaches a measured spectrum (CSV or Touchstone) of one connection to a version.
import { measurementSchema, type Measurement } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { measuredPaths } from './measuredPaths.js';
import { measuredQueryKeys } from './measuredQueryKeys.js';

/** The file and the form fields of the upload: ports by id or label, and an optional label. */
export type MeasurementUpload = { file: File; from: string; to: string; label: string };

/**
 * POST .../versions/:number/measurements, multipart fields `file`, `from`, `to`, `label` (owners, designers,
 * reviewers). The server answers 413 (too large), 415 (not .csv or .sNp), 422 (unreadable line or out of range).
 */
export function useUploadMeasurement(teamId: string, configurationId: string, versionNumber: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, from, to, label }: MeasurementUpload): Promise<Measurement> => {
      const form = new FormData();
      form.append('from', from);
      form.append('to', to);
      form.append('label', label);
      form.append('file', file, file.name);
      return apiFetch(measuredPaths.list(teamId, configurationId, versionNumber), measurementSchema, { method: 'POST', form });
    },
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: measuredQueryKeys.list(teamId, configurationId, versionNumber) }),
  });
}
