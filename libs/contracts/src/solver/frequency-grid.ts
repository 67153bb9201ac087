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
