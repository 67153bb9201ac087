/** The configuration file format (schema version 1): gate settings and the circuits that own them. */
import { z } from 'zod';
import { cellIdSchema, gateIdSchema, meshDefinitionSchema, portIdSchema } from './mesh-definition.js';

export const gatePortLabelSchema = z.enum(['a0', 'a1', 'b0', 'b1']);
export const gateStateSchema = z.enum(['bar', 'cross', 'split']);
export const parkedStateSchema = z.enum(['bar', 'cross']);

export const gateSettingSchema = z.object({
  gate: gateIdSchema,
  state: gateStateSchema,
  kappa: z.number().min(0).max(1).optional(),
  phaseRad: z.number().optional(),
  circuit: z.string().optional(),
});

export const pathStepSchema = z.object({ gate: gateIdSchema, in: gatePortLabelSchema, out: gatePortLabelSchema });

export const pathTerminalSchema = z.union([
  z.object({ port: portIdSchema }).strict(),
  z.object({ gate: gateIdSchema, at: gatePortLabelSchema }).strict(),
]);

export const circuitPathSchema = z.object({
  role: z.enum(['bus', 'ring', 'arm', 'branch', 'feed']),
  from: pathTerminalSchema,
  to: pathTerminalSchema,
  steps: z.array(pathStepSchema),
});

export const couplerGateSchema = z.object({
  gate: gateIdSchema,
  role: z.enum(['ring-coupler', 'splitter', 'combiner', 'ring-ring']),
  kappa: z.number().min(0).max(1),
  phaseRad: z.number(),
});

/** An outer phase a circuit sets on a gate it traverses in bar or cross (acts on that circuit's waveguide only). */
export const phaseSettingSchema = z.object({ gate: gateIdSchema, phaseRad: z.number().finite() });

export const circuitKindSchema = z.enum(['path', 'delay-line', 'ring', 'add-drop-ring', 'coupled-rings', 'mzi', 'mzi-lattice', 'splitter-tree', 'rings-on-bus']);

export const circuitSchema = z.object({
  id: z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/, 'a circuit id: a letter, then letters, digits, _ or -'),
  kind: circuitKindSchema,
  ports: z.array(portIdSchema),
  paths: z.array(circuitPathSchema),
  couplers: z.array(couplerGateSchema),
  phases: z.array(phaseSettingSchema).optional(),
  region: z.array(cellIdSchema).optional(),
});

/** A configuration file (`"schemaVersion": 1`), self-contained: it embeds its mesh definition. */
export const configurationSchema = z.object({
  schemaVersion: z.literal(1),
  mesh: meshDefinitionSchema,
  parkedState: parkedStateSchema,
  gates: z.array(gateSettingSchema),
  circuits: z.array(circuitSchema),
});
export type ConfigurationFile = z.infer<typeof configurationSchema>;
