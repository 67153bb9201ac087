/** The frequency grid of a solver request: one unit FSR at N points, or a span of offsets from the reference. */
import { z } from 'zod';

export const frequencyGridSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('fsr'), points: z.number().int().min(1).max(4_194_304) }),
  z.object({
    kind: z.literal('span'),
    startOffsetHz: z.number().finite(),
    stopOffsetHz: z.number().finite(),
    points: z.number().int().min(1).max(4_194_304),
  }).refine((g) => g.stopOffsetHz >= g.startOffsetHz, { message: 'stopOffsetHz must be >= startOffsetHz', path: ['stopOffsetHz'] }),
]);
export type FrequencyGridBody = z.infer<typeof frequencyGridSchema>;

/** Most points the team server computes for an FFT grid over the FSR (about 0.15 s on the demo chip). */
export const SERVER_MAX_FSR_POINTS = 65_536;
/** Most points the team server computes for a span (direct sum, about 0.15 s on the demo chip). */
export const SERVER_MAX_SPAN_POINTS = 16_384;

/** A grid the team server accepts: the solver's grid within the server's point caps (a 400 names the cap). */
export const serverFrequencyGridSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('fsr'), points: z.number().int().min(1).max(SERVER_MAX_FSR_POINTS) }),
  z
    .object({
      kind: z.literal('span'),
      startOffsetHz: z.number().finite(),
      stopOffsetHz: z.number().finite(),
      points: z.number().int().min(1).max(SERVER_MAX_SPAN_POINTS),
    })
    .refine((g) => g.stopOffsetHz >= g.startOffsetHz, { message: 'stopOffsetHz must be >= startOffsetHz', path: ['stopOffsetHz'] }),
]);
