// Creates a chip from a template size and technology, or from a chip definition.
import { chipSchema, type Chip, type CreateChip } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** POST /api/teams/:teamId/chips `{ name, template, technology }` or `{ definition }` (designers, owners); 422 when it does not build. */
export function useCreateChip(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateChip): Promise<Chip> => apiFetch(chipPaths(teamId), chipSchema, { method: 'POST', body }),
    onSuccess: (chip) => {
      queryClient.setQueryData(chipQueryKeys.chip(teamId, chip.id), chip);
      void queryClient.invalidateQueries({ queryKey: chipQueryKeys.chips(teamId), exact: true });
    },
  });
}
