/** Chips of a team: API bodies and answers (create from a template size or a chip JSON, edit, read). */
import { z } from 'zod';
import { singleLineText } from '../plain-text.js';
import { gateIdSchema, meshDefinitionSchema, portSpecSchema, technologyProfileSchema } from '../mesh/mesh-definition.js';

/** A chip as the API returns it; `definition` is the chip JSON (mesh definition file). */
export const chipSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  definition: meshDefinitionSchema,
  /** Counts every edit of the chip, starting at 1. */
  revision: z.number().int().positive(),
  createdBy: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  hasCalibration: z.boolean(),
  /** Versions of this chip's configurations whose circuits use a gate the chip now marks dead (re-route them). */
  affectedVersions: z.array(z.object({ configurationId: z.uuid(), configurationName: z.string(), number: z.number().int().positive(), status: z.string(), deadGates: z.array(gateIdSchema) })),
});
export type Chip = z.infer<typeof chipSchema>;

/** A rectangular template: rows x columns cells, I/O on the west and east sides (or every boundary site). */
export const chipTemplateSchema = z.object({
  rows: z.number().int().min(1).max(40),
  columns: z.number().int().min(1).max(40),
  io: z.enum(['all', 'left-right']).default('left-right'),
});
export type ChipTemplate = z.infer<typeof chipTemplateSchema>;

/** POST /chips body: a template size with a technology profile, or an uploaded chip JSON. */
export const createChipSchema = z.union([
  z.object({ name: singleLineText(1, 120), template: chipTemplateSchema, technology: technologyProfileSchema }).strict(),
  z.object({ definition: meshDefinitionSchema }).strict(),
]);
export type CreateChip = z.infer<typeof createChipSchema>;

/** PATCH /chips/:chipId body: any of name, technology profile, port wiring and dead gates. */
export const updateChipSchema = z
  .object({
    name: singleLineText(1, 120).optional(),
    technology: technologyProfileSchema.optional(),
    ports: z.array(portSpecSchema).optional(),
    deadGates: z.array(gateIdSchema).optional(),
  })
  .strict()
  .refine((b) => Object.keys(b).length > 0, { message: 'give at least one of name, technology, ports, deadGates' });
export type UpdateChip = z.infer<typeof updateChipSchema>;
