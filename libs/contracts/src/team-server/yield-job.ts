/** Monte Carlo yield as a background job: start body, job answer, progress events. */
import { z } from 'zod';
import { serverFrequencyGridSchema } from '../solver/frequency-grid.js';
import { maskSchema } from '../synth/mask.js';

/** POST .../yield-jobs body: perturb every used gate with seeded normal errors and check the mask. */
export const startYieldJobSchema = z.object({
  from: z.string().min(1),
  to: z.string().min(1),
  grid: serverFrequencyGridSchema,
  mask: maskSchema,
  runs: z.number().int().min(1).max(20_000),
  seed: z.number().int().min(0).max(2 ** 31 - 1),
  /** Standard deviation of each 3 dB coupler's splitting-angle error, rad. */
  couplerSigmaRad: z.number().min(0).max(0.5),
  /** Standard deviation of the internal and outer phase errors of each gate, rad. */
  phaseSigmaRad: z.number().min(0).max(1),
});
export type StartYieldJob = z.infer<typeof startYieldJobSchema>;

/** `interrupted`: the server stopped while the job ran (start it again). */
export const yieldJobStatusSchema = z.enum(['running', 'done', 'cancelled', 'failed', 'interrupted']);
export type YieldJobStatus = z.infer<typeof yieldJobStatusSchema>;

const spreadSchema = z.object({ mean: z.number(), std: z.number(), min: z.number(), p05: z.number(), p50: z.number(), p95: z.number(), max: z.number() });

export const yieldSummarySchema = z.object({
  runs: z.number().int(),
  passed: z.number().int(),
  yield: z.number(),
  yieldStdError: z.number(),
  figures: z.record(z.string(), spreadSchema),
});

/** A yield job as GET .../yield-jobs/:jobId returns it (and each server-sent `progress` event). */
export const yieldJobSchema = z.object({
  id: z.uuid(),
  versionId: z.uuid(),
  status: yieldJobStatusSchema,
  runsDone: z.number().int(),
  runsTotal: z.number().int(),
  summary: yieldSummarySchema.nullable(),
  error: z.string().nullable(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type YieldJob = z.infer<typeof yieldJobSchema>;
