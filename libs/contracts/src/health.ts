/** GET /api/health answer. */
import { z } from 'zod';

export const healthSchema = z.object({
  status: z.literal('ok'),
  version: z.string(),
  database: z.literal('ok'),
  uptimeS: z.number(),
});
export type Health = z.infer<typeof healthSchema>;
