// Edits a chip: name, technology profile, port wiring or dead gates.
import { chipSchema, type Chip, type UpdateChip } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** PATCH /api/teams/:teamId/chips/:chipId (designers, owners); the answer replaces the cached chip. */
export function useUpdateChip(teamId: string, chipId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateChip): Promise<Chip> => apiFetch(chipPaths(teamId, chipId), chipSchema, { method: 'PATCH', body }),
    onSuccess: (chip) => {
      queryClient.setQueryData(chipQueryKeys.chip(teamId, chipId), chip);
      void queryClient.invalidateQueries({ queryKey: chipQueryKeys.chips(teamId), exact: true });
    },
  });
}
