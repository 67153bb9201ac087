// Creates a chip from an uploaded chip JSON file.
import { chipSchema, type Chip } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';
import { uploadFile } from './uploadFile.js';

/** POST /api/teams/:teamId/chips/import, multipart `file` (a .json mesh definition) (designers, owners). */
export function useImportChip(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File): Promise<Chip> => uploadFile(chipPaths(teamId, undefined, 'import'), file, chipSchema, 'POST'),
    onSuccess: (chip) => {
      queryClient.setQueryData(chipQueryKeys.chip(teamId, chip.id), chip);
      void queryClient.invalidateQueries({ queryKey: chipQueryKeys.chips(teamId), exact: true });
    },
  });
}
