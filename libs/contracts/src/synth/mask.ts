/** The mask a synthesised circuit must meet: limits over stated frequency ranges. */
import { z } from 'zod';

const finite = z.number().finite();

/** A frequency range, as offsets from the reference (carrier) frequency, Hz. */
export const frequencyRangeSchema = z
  .object({ fromHz: finite, toHz: finite })
  .refine((range) => range.toHz > range.fromHz, { message: 'toHz must be above fromHz', path: ['toHz'] });

/**
 * One region of a mask. `pass`: insertion loss at most `maxInsertionLossDb` and ripple at most `maxRippleDb`;
 * `stop`: at least `minRejectionDb` below the pass-band peak; `delay`: group-delay ripple at most `maxDelayRipplePs`
 * (and, optionally, a mean delay within `delayTolerancePs` of `delayPs`).
 */
const port = {
  /** The output (port id or label) the region applies to; default: the circuit's main output(s). */
  port: z.string().min(1).max(64).optional(),
};

export const maskRegionSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('pass'),
    ...port,
    range: frequencyRangeSchema,
    maxInsertionLossDb: finite.min(0).optional(),
    maxRippleDb: finite.min(0).optional(),
  }),
  z.object({ kind: z.literal('stop'), ...port, range: frequencyRangeSchema, minRejectionDb: finite.min(0) }),
  z.object({
    kind: z.literal('delay'),
    ...port,
    range: frequencyRangeSchema,
    maxDelayRipplePs: finite.min(0).optional(),
    delayPs: finite.optional(),
    delayTolerancePs: finite.min(0).optional(),
  }),
]);
export type MaskRegion = z.infer<typeof maskRegionSchema>;

export const maskSchema = z.object({ regions: z.array(maskRegionSchema).max(32) });
export type Mask = z.infer<typeof maskSchema>;
