/** Body of a request to simulate a configuration between two ports, or to build its S-matrix. */
import { z } from 'zod';
import { frequencyGridSchema } from './frequency-grid.js';

export const impulseOptionsSchema = z.object({
  energyTolerance: z.number().gt(0).lt(1).optional(),
  maxSteps: z.number().int().positive().max(10_000_000).optional(),
});

export const simulateRequestSchema = z.object({
  from: z.string().min(1),
  to: z.string().min(1),
  grid: frequencyGridSchema,
  impulse: impulseOptionsSchema.optional(),
});
export type SimulateRequest = z.infer<typeof simulateRequestSchema>;

export const sParametersRequestSchema = z.object({
  ports: z.array(z.string().min(1)).min(1),
  grid: frequencyGridSchema,
  impulse: impulseOptionsSchema.optional(),
});
export type SParametersRequest = z.infer<typeof sParametersRequestSchema>;
