/** Compute routes on a version: synthesise, place/remove/re-route circuits, simulate, mask check. */
import { z } from 'zod';
import { circuitSchema, configurationSchema } from '../mesh/configuration.js';
import { routeRequestSchema } from '../mesh/route-request.js';
import { frequencyGridSchema } from '../solver/frequency-grid.js';
import { filterSpecSchema } from '../synth/filter-spec.js';
import { maskSchema } from '../synth/mask.js';

const circuitIdSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/, 'a circuit id: a letter, then letters, digits, _ or -');
const portRef = z.string().min(1).max(80);

/** A proposed new content (not saved: save it with POST .../versions and the version it was based on). */
export const proposalSchema = z.discriminatedUnion('ok', [
  z.object({
    ok: z.literal(true),
    basedOnVersion: z.number().int().positive(),
    content: configurationSchema,
    circuit: circuitSchema.nullable(),
    notes: z.array(z.string()),
  }),
  z.object({ ok: z.literal(false), reason: z.string(), message: z.string() }),
]);
export type Proposal = z.infer<typeof proposalSchema>;

/** POST .../synthesise body. */
export const synthesiseBodySchema = z.object({ circuitId: circuitIdSchema, spec: filterSpecSchema });
export type SynthesiseBody = z.infer<typeof synthesiseBodySchema>;

/** POST .../circuits body. */
export const placeCircuitBodySchema = z.object({ request: routeRequestSchema });
export type PlaceCircuitBody = z.infer<typeof placeCircuitBodySchema>;

/** POST .../simulate body: ports by id or label, a grid (span or one FSR). */
export const simulateBodySchema = z.object({ from: portRef, to: portRef, grid: frequencyGridSchema });
export type SimulateBody = z.infer<typeof simulateBodySchema>;

/** POST .../mask-check body. */
export const maskCheckBodySchema = z.object({ from: portRef, to: portRef, grid: frequencyGridSchema, mask: maskSchema });
export type MaskCheckBody = z.infer<typeof maskCheckBodySchema>;

export const maskCheckItemSchema = z.object({
  kind: z.enum(['pass', 'stop', 'delay']),
  quantity: z.string(),
  limit: z.number(),
  measured: z.number(),
  margin: z.number(),
  pass: z.boolean(),
  worstFrequencyHz: z.number(),
  unit: z.enum(['dB', 'ps']),
});

/** POST .../mask-check answer. */
export const maskCheckAnswerSchema = z.object({
  pass: z.boolean(),
  checks: z.array(maskCheckItemSchema),
  worst: maskCheckItemSchema.nullable(),
  figures: z.record(z.string(), z.number()),
});
export type MaskCheckAnswer = z.infer<typeof maskCheckAnswerSchema>;
