/** The JSON S-parameter file (`kind: "hexloom-sparameters"`, schema version 1); Touchstone is the other form. */
import { z } from 'zod';
import { impulseRunSchema } from './spectrum-file.js';

export const S_PARAMETERS_SCHEMA_VERSION = 1;

export const sParametersFileSchema = z.object({
  schemaVersion: z.literal(S_PARAMETERS_SCHEMA_VERSION),
  kind: z.literal('hexloom-sparameters'),
  ports: z.array(z.string()).min(1),
  referenceOhm: z.number().positive(),
  referenceFrequencyHz: z.number().positive(),
  frequencyHz: z.array(z.number()),
  /** `re[f][i][j]`, `im[f][i][j]`: S_ij at frequency f (wave out at port i for a wave in at port j). */
  re: z.array(z.array(z.array(z.number()))),
  im: z.array(z.array(z.array(z.number()))),
  runs: z.array(impulseRunSchema),
});
export type SParametersFile = z.infer<typeof sParametersFileSchema>;
