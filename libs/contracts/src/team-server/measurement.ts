/** Measured spectra attached to a version, and the simulated-vs-measured comparison. */
import { z } from 'zod';
import { singleLineText } from '../plain-text.js';

export const measurementFormatSchema = z.enum(['csv', 'touchstone']);

/** Form fields sent with the uploaded file (multipart/form-data, file field `file`). */
export const measurementUploadFieldsSchema = z.object({
  from: z.string().min(1).max(80),
  to: z.string().min(1).max(80),
  label: singleLineText(0, 200).default(''),
});
export type MeasurementUploadFields = z.infer<typeof measurementUploadFieldsSchema>;

export const measurementSchema = z.object({
  id: z.uuid(),
  versionNumber: z.number().int().positive(),
  fileName: z.string(),
  format: measurementFormatSchema,
  sizeBytes: z.number().int(),
  from: z.string(),
  to: z.string(),
  label: z.string(),
  points: z.number().int(),
  uploadedBy: z.string(),
  uploadedAt: z.string(),
});
export type Measurement = z.infer<typeof measurementSchema>;

/** GET .../measurements/:measurementId/comparison answer (offsets from the reference frequency, Hz). */
export const comparisonSchema = z.object({
  measurementId: z.uuid(),
  offsetHz: z.array(z.number()),
  simulatedDb: z.array(z.number()),
  measuredDb: z.array(z.number()),
  residualDb: z.array(z.number()),
  figures: z.object({
    points: z.number().int(),
    rmsResidualDb: z.number(),
    maxAbsResidualDb: z.number(),
    meanResidualDb: z.number(),
    worstOffsetHz: z.number(),
  }),
});
export type Comparison = z.infer<typeof comparisonSchema>;
