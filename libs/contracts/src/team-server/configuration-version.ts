/** Named configurations of a chip and their immutable versions: bodies, answers and the 409 answer. */
import { z } from 'zod';
import { singleLineText } from '../plain-text.js';
import { apiErrorSchema } from '../errors.js';
import { configurationSchema } from '../mesh/configuration.js';
import { filterSpecSchema } from '../synth/filter-spec.js';
import { versionNumberSchema } from './version-number.js';

/** Review status of one version. */
export const versionStatusSchema = z.enum(['draft', 'in_review', 'approved', 'changes_requested']);
export type VersionStatus = z.infer<typeof versionStatusSchema>;

/** The specification a circuit was synthesised from. */
export const circuitSpecSchema = z.object({ circuitId: z.string().min(1).max(64), spec: filterSpecSchema });
export type CircuitSpec = z.infer<typeof circuitSpecSchema>;

/** Figures of one circuit, saved with the version so diffs can show how they changed. */
export const circuitFiguresSchema = z.record(z.string(), z.record(z.string(), z.number()));
export type CircuitFigures = z.infer<typeof circuitFiguresSchema>;

/** One immutable version (the content never changes; only its review status does). */
export const configurationVersionSchema = z.object({
  id: z.uuid(),
  configurationId: z.uuid(),
  number: z.number().int().positive(),
  status: versionStatusSchema,
  author: z.string(),
  note: z.string(),
  createdAt: z.string(),
  content: configurationSchema,
  specs: z.array(circuitSpecSchema),
  figures: circuitFiguresSchema,
  approvedBy: z.string().nullable(),
  approvedAt: z.string().nullable(),
  /** Gates this version's circuits use that the chip now marks dead: re-route before it goes to the bench. */
  deadGatesInUse: z.array(z.string()),
});
export type ConfigurationVersion = z.infer<typeof configurationVersionSchema>;

/** A version without its content, for lists. */
export const versionSummarySchema = configurationVersionSchema.omit({ content: true, specs: true, figures: true });
export type VersionSummary = z.infer<typeof versionSummarySchema>;

/** A named configuration with the number of its newest version. */
export const configurationSummarySchema = z.object({
  id: z.uuid(),
  chipId: z.uuid(),
  name: z.string(),
  headVersion: z.number().int().positive(),
  headStatus: versionStatusSchema,
  createdBy: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type ConfigurationSummary = z.infer<typeof configurationSummarySchema>;

/** GET /configurations/:configurationId answer. */
export const configurationDetailSchema = configurationSummarySchema.extend({ versions: z.array(versionSummarySchema) });
export type ConfigurationDetail = z.infer<typeof configurationDetailSchema>;

const nameSchema = singleLineText(1, 120);

/**
 * POST /chips/:chipId/configurations body; without `content` the first version has every gate parked. The figures
 * saved with it are computed by the server from the content and the specs.
 */
export const createConfigurationSchema = z.object({
  name: nameSchema,
  content: configurationSchema.optional(),
  specs: z.array(circuitSpecSchema).default([]),
  note: z.string().max(2000).default(''),
});
export type CreateConfiguration = z.infer<typeof createConfigurationSchema>;

/**
 * POST /configurations/:configurationId/versions body: a save based on `baseVersion`. The figures saved with the
 * version are recomputed by the server for every circuit with a spec (a figure sent by the client is not taken).
 */
export const saveVersionSchema = z.object({
  baseVersion: versionNumberSchema,
  content: configurationSchema,
  specs: z.array(circuitSpecSchema).default([]),
  note: z.string().max(2000).default(''),
});
export type SaveVersion = z.infer<typeof saveVersionSchema>;

/** POST /configurations/:configurationId/duplicate body. */
export const duplicateConfigurationSchema = z.object({ name: nameSchema, fromVersion: versionNumberSchema.optional() });
export type DuplicateConfiguration = z.infer<typeof duplicateConfigurationSchema>;

/** The 409 answer of a stale save: the error plus the newer version, so nothing is lost. */
export const staleVersionErrorSchema = apiErrorSchema.extend({ latest: configurationVersionSchema });
export type StaleVersionError = z.infer<typeof staleVersionErrorSchema>;
