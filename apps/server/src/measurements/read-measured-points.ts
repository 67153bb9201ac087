/** Reads measured power versus absolute frequency from a spectrum CSV or a Touchstone file, and checks its ranges. */
import { readSpectrumCsv, readTouchstone } from '@hexloom/solver';
import type { MeasuredPoints } from '../db/schema/index.js';
import { MeasurementRangeError } from './measurement-errors.js';

/** Accepted measured span around the chip's reference frequency, Hz (a bench sweep is far narrower). */
export const MAX_DISTANCE_FROM_REFERENCE_HZ = 20e12;
/** Accepted measured power range, dB. */
export const POWER_RANGE_DB = { min: -300, max: 60 } as const;

/**
 * CSV: the solver's spectrum CSV reader (frequency_hz or frequency_ghz, amplitude_db or re/im).
 * Touchstone: S21 (port 1 = the `from` port, port 2 = the `to` port) or S11 for a one-port, 20 log10 |S|.
 * Library errors name the line (422); values outside the ranges are refused here (422).
 */
export function readMeasuredPoints(text: string, fileName: string, referenceFrequencyHz: number): { format: 'csv' | 'touchstone'; points: MeasuredPoints } {
  let format: 'csv' | 'touchstone';
  let frequencyHz: number[];
  let powerDb: number[];
  if (/\.csv$/i.test(fileName)) {
    format = 'csv';
    const s = readSpectrumCsv(text);
    frequencyHz = Array.from(s.frequenciesHz);
    powerDb = Array.from(s.amplitudeDb);
  } else {
    format = 'touchstone';
    const t = readTouchstone(text, { fileName });
    const n = t.portCount;
    const [i, j] = n >= 2 ? [1, 0] : [0, 0];
    frequencyHz = Array.from(t.frequenciesHz);
    powerDb = frequencyHz.map((_, f) => {
      const k = (f * n + i) * n + j;
      return 20 * Math.log10(Math.hypot(t.re[k] ?? 0, t.im[k] ?? 0));
    });
  }
  if (frequencyHz.length < 2) throw new MeasurementRangeError(fileName, `only ${frequencyHz.length} point(s); at least 2 are needed`);
  frequencyHz.forEach((f, k) => {
    if (!(Math.abs(f - referenceFrequencyHz) <= MAX_DISTANCE_FROM_REFERENCE_HZ)) {
      throw new MeasurementRangeError(fileName, `point ${k + 1} is at ${f} Hz, more than ${MAX_DISTANCE_FROM_REFERENCE_HZ} Hz from the chip's reference ${referenceFrequencyHz} Hz (absolute optical frequencies are expected)`);
    }
    const p = powerDb[k] as number;
    if (!(p >= POWER_RANGE_DB.min && p <= POWER_RANGE_DB.max)) throw new MeasurementRangeError(fileName, `point ${k + 1} has power ${p} dB, outside ${POWER_RANGE_DB.min} .. ${POWER_RANGE_DB.max} dB`);
  });
  return { format, points: { frequencyHz, powerDb } };
}
