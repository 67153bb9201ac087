/** The mesh definition file format (schema version 1): shape, I/O sites, wiring, dead gates, technology. */
import { z } from 'zod';
import { singleLineText } from '../plain-text.js';

const cellIdRe = /^c\(-?\d+,-?\d+\)$/;
const vertexIdRe = /^v\(-?\d+,-?\d+\)[ns]$/;
const gateIdRe = /^g\(-?\d+,-?\d+\)(e|ne|nw)$/;
const portIdRe = /^v\(-?\d+,-?\d+\)[ns]\/g\(-?\d+,-?\d+\)(e|ne|nw)$/;

/** `c(q,r)`. */
export const cellIdSchema = z.string().regex(cellIdRe, 'a cell id c(q,r)');
/** `v(q,r)n` or `v(q,r)s`. */
export const vertexIdSchema = z.string().regex(vertexIdRe, 'a vertex id v(q,r)n or v(q,r)s');
/** `g(q,r)e`, `g(q,r)ne` or `g(q,r)nw`. */
export const gateIdSchema = z.string().regex(gateIdRe, 'a gate id g(q,r)e, g(q,r)ne or g(q,r)nw');
/** `<vertex id>/<gate id>`. */
export const portIdSchema = z.string().regex(portIdRe, 'a port id v(q,r)n/g(q,r)e');

export const axialSchema = z.object({ q: z.number().int(), r: z.number().int() });

export const meshShapeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rectangle'), rows: z.number().int().min(1).max(500), columns: z.number().int().min(1).max(500) }),
  z.object({ kind: z.literal('hexagon'), radius: z.number().int().min(0).max(300) }),
  z.object({ kind: z.literal('cells'), cells: z.array(axialSchema).min(1) }),
]);

export const portWiringSchema = z.enum(['fibre', 'modulator', 'detector', 'none']);

export const portSpecSchema = z.object({
  id: portIdSchema,
  wiredTo: portWiringSchema,
  label: z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,31}$/, 'a label: a letter, then letters, digits, _ or -').optional(),
});

export const phaseShifterProfileSchema = z.object({
  piPowerW: z.number().positive(),
  resistanceOhm: z.number().positive(),
  maxPowerW: z.number().positive(),
  maxVoltageV: z.number().positive(),
});

export const technologyProfileSchema = z.object({
  unitLengthUm: z.number().positive(),
  groupIndex: z.number().positive(),
  referenceFrequencyHz: z.number().positive(),
  lossPerGateDb: z.number().min(0),
  bendLossDb: z.number().min(0),
  extinctionDb: z.number().min(0),
  phaseShifter: phaseShifterProfileSchema,
  /** Fabrication and drive spreads for tolerance studies (standard deviations, radians). */
  tolerance: z.object({ couplerSigmaRad: z.number().min(0).max(1), phaseSigmaRad: z.number().min(0).max(1) }).optional(),
});

/** A mesh definition file (`"schemaVersion": 1`). */
export const meshDefinitionSchema = z.object({
  schemaVersion: z.literal(1),
  name: singleLineText(1, 120),
  shape: meshShapeSchema,
  technology: technologyProfileSchema,
  ioSites: z.array(vertexIdSchema),
  ports: z.array(portSpecSchema),
  deadGates: z.array(gateIdSchema),
  gateLossDb: z.record(gateIdSchema, z.number().min(0)).optional(),
});
export type MeshDefinitionFile = z.infer<typeof meshDefinitionSchema>;
