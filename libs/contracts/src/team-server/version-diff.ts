/** The diff between two versions of a configuration: gates, circuits, specs and figures. */
import { z } from 'zod';
import { gateSettingSchema } from '../mesh/configuration.js';
import { versionNumberParamSchema } from './version-number.js';

export const gateChangeSchema = z.object({
  gate: z.string(),
  before: gateSettingSchema.nullable(),
  after: gateSettingSchema.nullable(),
});
export type GateChange = z.infer<typeof gateChangeSchema>;

export const figureChangeSchema = z.object({
  circuitId: z.string(),
  figure: z.string(),
  before: z.number().nullable(),
  after: z.number().nullable(),
});
export type FigureChange = z.infer<typeof figureChangeSchema>;

/** GET /configurations/:configurationId/diff answer. */
export const versionDiffSchema = z.object({
  from: z.number().int().positive(),
  to: z.number().int().positive(),
  gatesChanged: z.array(gateChangeSchema),
  circuitsAdded: z.array(z.string()),
  circuitsRemoved: z.array(z.string()),
  circuitsChanged: z.array(z.string()),
  parkedStateChanged: z.boolean(),
  figureChanges: z.array(figureChangeSchema),
});
export type VersionDiff = z.infer<typeof versionDiffSchema>;

/** GET .../diff query. */
export const diffQuerySchema = z.object({ from: versionNumberParamSchema, to: versionNumberParamSchema });
export type DiffQuery = z.infer<typeof diffQuerySchema>;
