/** The bench export format (schema version 1): gate states, drive values per phase shifter, checksum. */
import { z } from 'zod';
import { gateSettingSchema } from '../mesh/configuration.js';
import { shifterKindSchema } from './calibration.js';

/** Version of the bench export format. */
export const BENCH_EXPORT_SCHEMA_VERSION = 1;

/** Drive of one phase shifter. */
export const driveValueSchema = z.object({
  gate: z.string(),
  shifter: shifterKindSchema,
  /** Phase the shifter must add, rad, in [0, 2 pi). */
  targetPhaseRad: z.number(),
  /** Heater power, W; voltage, V; current, A. */
  powerW: z.number(),
  voltageV: z.number(),
  currentA: z.number(),
  /** `calibration` when a calibration row exists, else `profile` (the chip's technology figures). */
  source: z.enum(['calibration', 'profile']),
});
export type DriveValueBody = z.infer<typeof driveValueSchema>;

/** The JSON bench export (the CSV form carries the same values; see docs/formats.md, "Bench export"). */
export const benchExportSchema = z.object({
  schemaVersion: z.literal(BENCH_EXPORT_SCHEMA_VERSION),
  kind: z.literal('hexloom-bench-export'),
  chip: z.string(),
  configuration: z.string(),
  version: z.number().int().positive(),
  approved: z.boolean(),
  /** "approved" or "not approved" — shown at the top of every export. */
  approval: z.enum(['approved', 'not approved']),
  cautions: z.array(z.string()),
  parkedState: z.enum(['bar', 'cross']),
  gates: z.array(gateSettingSchema),
  drives: z.array(driveValueSchema),
  totalPowerW: z.number(),
  /** SHA-256 hex of the canonical JSON of every other field. */
  checksum: z.string().regex(/^[0-9a-f]{64}$/),
});
export type BenchExportBody = z.infer<typeof benchExportSchema>;

/** One shifter beyond its limit, as listed by the 422 answer. */
export const driveViolationSchema = z.object({
  gate: z.string(),
  shifter: shifterKindSchema,
  quantity: z.enum(['power', 'voltage']),
  value: z.number(),
  limit: z.number(),
});

/** The 422 answer of a bench export whose drive values exceed a limit. */
export const driveLimitErrorSchema = z.object({
  statusCode: z.literal(422),
  error: z.string(),
  message: z.string(),
  violations: z.array(driveViolationSchema),
  cautions: z.array(z.string()),
});

/** GET .../bench-export query. */
export const benchExportQuerySchema = z.object({ format: z.enum(['json', 'csv']).default('json') });

/** GET .../touchstone query: ports (ids or labels; repeat `ports`, or separate with `;` since port ids hold commas) and the grid. */
export const touchstoneQuerySchema = z.object({
  ports: z
    .union([z.string(), z.array(z.string())])
    .transform((v) => (Array.isArray(v) ? v : [v]).flatMap((s) => s.split(';')).map((p) => p.trim()).filter((p) => p.length > 0))
    .pipe(z.array(z.string()).min(1).max(16)),
  startOffsetHz: z.coerce.number().finite(),
  stopOffsetHz: z.coerce.number().finite(),
  points: z.coerce.number().int().min(2).max(20_001),
});
