/** Compute routes on a version: synthesise, place/remove/re-route circuits, simulate, mask check. */
import { z } from 'zod';
import { circuitSchema, configurationSchema } from '../mesh/configuration.js';
import { routeRequestSchema } from '../mesh/route-request.js';
import { serverFrequencyGridSchema } from '../solver/frequency-grid.js';
import { filterSpecSchema } from '../synth/filter-spec.js';
import { maskSchema } from '../synth/mask.js';
import { circuitSpecSchema } from './configuration-version.js';

const circuitIdSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/, 'a circuit id: a letter, then letters, digits, _ or -');
const portRef = z.string().min(1).max(80);

/** What the synthesiser had to change to fit whole unit lengths. */
export const realisationNoteSchema = z.object({ quantity: z.string(), requested: z.number().nullable(), achieved: z.number(), unit: z.string(), note: z.string() });

export const maskCheckItemSchema = z.object({
  /** A mask region's kind, or `target` for a check derived from the specification's own targets. */
  kind: z.enum(['pass', 'stop', 'delay', 'target']),
  quantity: z.string(),
  limit: z.number(),
  measured: z.number(),
  direction: z.enum(['at-most', 'at-least']),
  margin: z.number(),
  pass: z.boolean(),
  worstFrequencyHz: z.number(),
  unit: z.enum(['dB', 'ps', 'Hz', '%', 'ps/GHz']),
});

/** One verified output of a synthesised circuit: ports by id and by the chip's name, checks and figures. */
export const outputVerificationSchema = z.object({
  from: z.string(),
  fromName: z.string(),
  to: z.string(),
  toName: z.string(),
  role: z.enum(['main', 'through']),
  pass: z.boolean(),
  checks: z.array(maskCheckItemSchema),
  figures: z.record(z.string(), z.number()),
});
export type OutputVerification = z.infer<typeof outputVerificationSchema>;

/** A proposed new content (not saved: save it with POST .../versions and the version it was based on). */
export const proposalSchema = z.discriminatedUnion('ok', [
  z.object({
    ok: z.literal(true),
    basedOnVersion: z.number().int().positive(),
    content: configurationSchema,
    circuit: circuitSchema.nullable(),
    notes: z.array(realisationNoteSchema),
    /** Synthesis only: the design numbers, and per output the mask report and figures of the whole-chip simulation. */
    design: z.record(z.string(), z.unknown()).nullable(),
    verification: z.array(outputVerificationSchema),
    /** Synthesis only: passes when every check of every output does. */
    verdict: z.object({ pass: z.boolean(), checks: z.number().int(), failed: z.number().int() }).nullable(),
    /** The other circuits whose specs were verified again on the proposed content (leakage couples them a little). */
    others: z.array(z.object({ circuitId: z.string(), pass: z.boolean(), failed: z.array(z.string()) })).default([]),
    /** Figures and specs to save with the version (the base version's, updated for this change). */
    figures: z.record(z.string(), z.record(z.string(), z.number())),
    specs: z.array(circuitSpecSchema),
  }),
  z.object({ ok: z.literal(false), reason: z.string(), message: z.string(), notes: z.array(realisationNoteSchema) }),
]);
export type Proposal = z.infer<typeof proposalSchema>;

/** POST .../synthesise body. */
export const synthesiseBodySchema = z.object({ circuitId: circuitIdSchema, spec: filterSpecSchema });
export type SynthesiseBody = z.infer<typeof synthesiseBodySchema>;

/** POST .../circuits body. */
export const placeCircuitBodySchema = z.object({ request: routeRequestSchema });
export type PlaceCircuitBody = z.infer<typeof placeCircuitBodySchema>;

/** POST .../circuits/:circuitId/reroute body: a new request (its id must be the circuit's), or none to re-synthesise from the saved spec. */
export const rerouteCircuitBodySchema = z.object({ request: routeRequestSchema.optional() });
export type RerouteCircuitBody = z.infer<typeof rerouteCircuitBodySchema>;

/** POST .../simulate body: ports by id or label, a grid (span or one FSR). */
export const simulateBodySchema = z.object({ from: portRef, to: portRef, grid: serverFrequencyGridSchema });
export type SimulateBody = z.infer<typeof simulateBodySchema>;

/** POST .../mask-check body. */
export const maskCheckBodySchema = z.object({ from: portRef, to: portRef, grid: serverFrequencyGridSchema, mask: maskSchema });
export type MaskCheckBody = z.infer<typeof maskCheckBodySchema>;

/** POST .../mask-check answer. */
export const maskCheckAnswerSchema = z.object({
  pass: z.boolean(),
  checks: z.array(maskCheckItemSchema),
  worst: maskCheckItemSchema.nullable(),
  figures: z.record(z.string(), z.number()),
});
export type MaskCheckAnswer = z.infer<typeof maskCheckAnswerSchema>;
