// Uploads a calibration CSV for a chip.
import { calibrationSchema, type Calibration } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';
import { uploadFile } from './uploadFile.js';

/** PUT /api/teams/:teamId/chips/:chipId/calibration, multipart `file` (designers, owners); a 422 lists each bad line. */
export function usePutCalibration(teamId: string, chipId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File): Promise<Calibration> => uploadFile(chipPaths(teamId, chipId, 'calibration'), file, calibrationSchema, 'PUT'),
    onSuccess: (calibration) => {
      queryClient.setQueryData(chipQueryKeys.calibration(teamId, chipId), calibration);
      void queryClient.invalidateQueries({ queryKey: chipQueryKeys.chip(teamId, chipId), exact: true });
      void queryClient.invalidateQueries({ queryKey: chipQueryKeys.chips(teamId), exact: true });
    },
  });
}
