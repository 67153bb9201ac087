/** The JSON spectrum file (`kind: "hexloom-spectrum"`, schema version 1) and the spectrum CSV columns. */
import { z } from 'zod';

export const SPECTRUM_SCHEMA_VERSION = 1;

/** Columns of the spectrum CSV, in order (see docs/formats.md, "Solver"). */
export const SPECTRUM_CSV_HEADER = ['frequency_hz', 'offset_hz', 'amplitude_db', 'phase_deg', 'group_delay_ps', 'dispersion_ps_per_nm', 're', 'im'] as const;

export const impulseRunSchema = z.object({
  inputPort: z.string(),
  steps: z.number().int().nonnegative(),
  residualEnergy: z.number().nonnegative(),
  converged: z.boolean(),
  warning: z.string().nullable(),
});

export const powerBalanceSchema = z.object({
  inputPort: z.string(),
  chosen: z.record(z.string(), z.number()),
  leakage: z.record(z.string(), z.number()),
  lost: z.number(),
  residual: z.number(),
});

/** Non-finite values (the dB of an exact zero) are written as null. */
const series = z.array(z.number().nullable());

export const spectrumFileSchema = z.object({
  schemaVersion: z.literal(SPECTRUM_SCHEMA_VERSION),
  kind: z.literal('hexloom-spectrum'),
  from: z.string(),
  to: z.string(),
  /** The chip's names of the ports (labels such as W03), or their ids when unlabelled. */
  fromName: z.string(),
  toName: z.string(),
  referenceFrequencyHz: z.number().positive(),
  unitDelayS: z.number().positive(),
  method: z.enum(['fft', 'direct-sum']),
  run: impulseRunSchema,
  powerBalance: powerBalanceSchema,
  points: z.object({
    frequencyHz: z.array(z.number()),
    offsetHz: z.array(z.number()),
    amplitudeDb: series,
    phaseDeg: z.array(z.number()),
    groupDelayPs: series,
    dispersionPsPerNm: series,
    re: z.array(z.number()),
    im: z.array(z.number()),
  }),
});
export type SpectrumFile = z.infer<typeof spectrumFileSchema>;
