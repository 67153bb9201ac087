/** The route request file format: which circuit to place, between which ports (ids or labels). */
import { z } from 'zod';
import { cellIdSchema } from './mesh-definition.js';

const common = {
  id: z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/, 'a circuit id: a letter, then letters, digits, _ or -'),
  region: z.array(cellIdSchema).optional(),
  budget: z.number().int().min(1).max(50_000_000).optional(),
};
const port = z.string().min(1);
const kappa = z.number().min(0).max(1);
const units = z.number().int();

/** One circuit to place (`hexloom route`); see docs/formats.md. */
export const routeRequestSchema = z.discriminatedUnion('kind', [
  z.object({ ...common, kind: z.literal('path'), from: port, to: port, metric: z.enum(['length', 'loss']).optional() }),
  z.object({ ...common, kind: z.literal('delay-line'), from: port, to: port, lengthUnits: units.min(1) }),
  z.object({ ...common, kind: z.literal('ring'), from: port, to: port, perimeterUnits: units, kappa, phaseRad: z.number().optional() }),
  z.object({ ...common, kind: z.literal('add-drop-ring'), from: port, to: port, add: port.optional(), drop: port, perimeterUnits: units, kappa, dropKappa: kappa.optional() }),
  z.object({ ...common, kind: z.literal('rings-on-bus'), from: port, to: port, rings: z.array(z.object({ perimeterUnits: units, kappa })).min(1).max(12) }),
  z.object({ ...common, kind: z.literal('coupled-rings'), from: port, to: port, drop: port, add: port.optional(), rings: units.min(1).max(50), kappas: z.array(kappa) }),
  z.object({ ...common, kind: z.literal('mzi'), from: port, to: port, lengthDifferenceUnits: units.min(0), kappas: z.array(kappa).optional() }),
  z.object({ ...common, kind: z.literal('mzi-lattice'), from: port, to: port, lengthDifferencesUnits: z.array(units.min(0)).min(1), kappas: z.array(kappa).optional() }),
  z.object({ ...common, kind: z.literal('splitter-tree'), from: port, outputs: z.array(z.object({ port, delayUnits: units.min(1) })).min(2) }),
]);
export type RouteRequestFile = z.infer<typeof routeRequestSchema>;
