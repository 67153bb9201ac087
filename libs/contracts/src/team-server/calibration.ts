/** The calibration CSV format (one row per phase shifter) and the stored calibration answer. */
import { z } from 'zod';
import { gateIdSchema } from '../mesh/mesh-definition.js';

/** Columns of the calibration CSV, in this order (see docs/formats.md, "Calibration"). */
export const CALIBRATION_CSV_COLUMNS = ['gate', 'shifter', 'offset_rad', 'p_pi_mw', 'resistance_ohm', 'max_power_mw', 'max_voltage_v'] as const;

/** Which phase shifter of a gate: the internal one (sets kappa) or the outer one (sets the phase). */
export const shifterKindSchema = z.enum(['theta', 'phi']);
export type ShifterKind = z.infer<typeof shifterKindSchema>;

/** Accepted ranges of the calibration values, in SI units (the CSV gives mW for powers). */
export const CALIBRATION_RANGES = {
  offsetRad: { min: -2 * Math.PI, max: 2 * Math.PI },
  piPowerW: { min: 1e-4, max: 1 },
  resistanceOhm: { min: 1, max: 1e6 },
  maxPowerW: { min: 1e-4, max: 2 },
  maxVoltageV: { min: 0.1, max: 100 },
} as const;

const inRange = (r: { min: number; max: number }) => z.number().finite().min(r.min).max(r.max);

/** One calibrated phase shifter, SI units. */
export const shifterCalibrationSchema = z.object({
  gate: gateIdSchema,
  shifter: shifterKindSchema,
  offsetRad: inRange(CALIBRATION_RANGES.offsetRad),
  piPowerW: inRange(CALIBRATION_RANGES.piPowerW),
  resistanceOhm: inRange(CALIBRATION_RANGES.resistanceOhm),
  maxPowerW: inRange(CALIBRATION_RANGES.maxPowerW),
  maxVoltageV: inRange(CALIBRATION_RANGES.maxVoltageV),
});
export type ShifterCalibrationBody = z.infer<typeof shifterCalibrationSchema>;

/** GET/PUT /chips/:chipId/calibration answer. */
export const calibrationSchema = z.object({
  id: z.uuid(),
  chipId: z.uuid(),
  fileName: z.string(),
  uploadedBy: z.string(),
  uploadedAt: z.string(),
  shifters: z.array(shifterCalibrationSchema),
});
export type Calibration = z.infer<typeof calibrationSchema>;
