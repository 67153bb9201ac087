// The simulated response of a version between two ports (the server caches it by content hash).
import { spectrumFileSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** Points of the plotted span: -20 .. +20 GHz around the carrier. */
export const PLOT_SPAN = { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 801 } as const;

/** POST .../versions/:number/simulate from `from` to `to` on the plot span (any member). */
export function useSimulation(input: { teamId: string; configurationId: string; number: number | undefined; from: string | undefined; to: string | undefined }) {
  const { teamId, configurationId, number, from, to } = input;
  return useQuery({
    queryKey: chipQueryKeys.simulation(teamId, configurationId, number ?? 0, from ?? '', to ?? ''),
    enabled: number !== undefined && from !== undefined && to !== undefined,
    staleTime: Infinity,
    queryFn: ({ signal }) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${number}/simulate`, spectrumFileSchema, {
        method: 'POST',
        body: { from, to, grid: PLOT_SPAN },
        signal,
      }),
  });
}
