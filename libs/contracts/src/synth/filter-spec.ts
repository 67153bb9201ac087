/** The specification file format: what a designer asks for, with its mask (see docs/formats.md). */
import { z } from 'zod';
import { singleLineText } from '../plain-text.js';
import { cellIdSchema } from '../mesh/mesh-definition.js';
import { frequencyRangeSchema, maskSchema } from './mask.js';

/** Version of the specification file format. */
export const SPEC_SCHEMA_VERSION = 1;

const finite = z.number().finite();
const positive = finite.positive();

/** An external port by id (`v(q,r)n/g(q,r)e`) or by its label in the mesh definition. */
const portIdSchema = z.string().min(1).max(64);

/** The band a delay must hold over (offsets from the carrier, Hz); default -1 GHz .. +1 GHz. */
const delayBand = {
  bandHz: frequencyRangeSchema.optional(),
  /** Largest peak-to-peak group-delay ripple over the band, ps (default: twice the tolerance). */
  maxDelayRipplePs: finite.min(0).optional(),
};

const placement = {
  /** Cells the circuit must stay inside (optional). */
  region: z.array(cellIdSchema).max(4096).optional(),
};

const ringSize = z
  .union([z.object({ perimeterUnits: z.number().int().min(6).max(400) }), z.object({ fsrHz: positive }), z.object({ free: z.literal(true) })])
  .default({ free: true });

export const delayLineSpecSchema = z.object({
  kind: z.literal('delay-line'),
  from: portIdSchema,
  to: portIdSchema,
  delay: z.union([z.object({ ps: positive }), z.object({ units: z.number().int().positive() })]),
  /** Largest delay error at the carrier, ps (default: half a unit delay, the quantisation of the mesh). */
  tolerancePs: finite.min(0).optional(),
  ...delayBand,
  ...placement,
});

export const ttdSetSpecSchema = z.object({
  kind: z.literal('ttd-set'),
  from: portIdSchema,
  outputs: z.array(portIdSchema).min(2).max(32),
  /** Delay step between consecutive outputs, ps. */
  stepPs: positive,
  /** Extra common delay added to every output, ps (default: as short as routing allows). */
  basePs: finite.min(0).optional(),
  /** Largest delay error of each output at the carrier, ps (default: half a unit delay). */
  tolerancePs: finite.min(0).optional(),
  /** Largest power difference between any output and the strongest one at the carrier, dB (default 1). */
  maxImbalanceDb: finite.min(0).optional(),
  ...delayBand,
  ...placement,
});

export const ringNotchSpecSchema = z.object({
  kind: z.literal('ring-notch'),
  from: portIdSchema,
  to: portIdSchema,
  centreOffsetHz: finite,
  target: z.union([
    z.object({ notchDepthDb: positive, regime: z.enum(['under', 'over']).default('under') }),
    z.object({ fwhmHz: positive }),
    z.object({ critical: z.literal(true) }),
  ]),
  ring: ringSize,
  /** How far the notch depth may fall short of a depth target, dB (default 1). */
  depthToleranceDb: finite.min(0).optional(),
  /** How far the notch width may miss a width target, % (default 10). */
  widthTolerancePercent: finite.min(0).optional(),
  ...placement,
});

export const addDropSpecSchema = z.object({
  kind: z.literal('add-drop'),
  from: portIdSchema,
  through: portIdSchema,
  drop: portIdSchema,
  centreOffsetHz: finite,
  bandwidthHz: positive,
  ring: ringSize,
  /** How far the drop band's 3 dB width may miss the request, % (default 15). */
  widthTolerancePercent: finite.min(0).optional(),
  ...placement,
});

export const coupledRingSpecSchema = z.object({
  kind: z.literal('coupled-ring-bandpass'),
  from: portIdSchema,
  /** The filtered (drop) output. */
  to: portIdSchema,
  /** Where the rest of the light leaves the input bus. */
  through: portIdSchema,
  response: z.enum(['butterworth', 'chebyshev']),
  order: z.number().int().min(1).max(8),
  rippleDb: positive.max(3).optional(),
  bandwidthHz: positive,
  centreOffsetHz: finite,
  /** How far the pass band's width may miss the request, % (default 15). */
  widthTolerancePercent: finite.min(0).optional(),
  ...placement,
});

export const latticeSpecSchema = z.object({
  kind: z.literal('mzi-lattice'),
  from: portIdSchema,
  to: portIdSchema,
  band: z.enum(['band-pass', 'band-stop', 'half-band', 'polynomial']),
  order: z.number().int().min(1).max(16),
  /** Arm length difference of each stage, units (even: the lattice is bipartite). */
  armDifferenceUnits: z.number().int().min(2).max(40).multipleOf(2).default(2),
  centreOffsetHz: finite.default(0),
  widthHz: positive.optional(),
  rejectionDb: positive.default(30),
  /** For `polynomial`: coefficients of A(z), real and imaginary parts. */
  coefficients: z.array(z.object({ re: finite, im: finite.default(0) })).max(17).optional(),
  /** How far the stop-band rejection may fall short of `rejectionDb`, dB (default 1). */
  rejectionToleranceDb: finite.min(0).optional(),
  /** For `polynomial`: largest power error against |A|^2 where |A|^2 is above -20 dB, dB (default 1). */
  shapeToleranceDb: finite.min(0).optional(),
  ...placement,
});

export const transversalSpecSchema = z.object({
  kind: z.literal('transversal'),
  from: portIdSchema,
  to: portIdSchema,
  /** Tap weights (field amplitudes, relative); tap k is delayed by k * tapDelayUnits. */
  taps: z.array(finite).min(2).max(16),
  tapDelayUnits: z.number().int().min(2).max(100).multipleOf(2),
  /** Largest power error against the taps' response where it is above -20 dB, dB (default 1). */
  shapeToleranceDb: finite.min(0).optional(),
  ...placement,
});

export const allPassEqualiserSpecSchema = z.object({
  kind: z.literal('allpass-equaliser'),
  from: portIdSchema,
  to: portIdSchema,
  band: z.object({ fromHz: finite, toHz: finite }),
  target: z.union([z.object({ delayPs: positive }), z.object({ slopePsPerGHz: finite })]),
  stages: z.number().int().min(1).max(6),
  /** Largest deviation of the excess delay from the target over the band, ps (default 10 % of the largest target delay, at least 1 ps). */
  tolerancePs: finite.min(0).optional(),
  ...placement,
});

/** Every kind of specification. */
export const filterSpecBodySchema = z.discriminatedUnion('kind', [
  delayLineSpecSchema,
  ttdSetSpecSchema,
  ringNotchSpecSchema,
  addDropSpecSchema,
  coupledRingSpecSchema,
  latticeSpecSchema,
  transversalSpecSchema,
  allPassEqualiserSpecSchema,
]);

/** A specification file: a named request with its mask. */
export const filterSpecSchema = z.object({
  schemaVersion: z.literal(SPEC_SCHEMA_VERSION),
  name: singleLineText(1, 120),
  spec: filterSpecBodySchema,
  mask: maskSchema.default({ regions: [] }),
});
export type FilterSpec = z.infer<typeof filterSpecSchema>;
export type FilterSpecBody = z.infer<typeof filterSpecBodySchema>;
export type FilterSpecKind = FilterSpecBody['kind'];
