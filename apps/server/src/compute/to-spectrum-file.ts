/** Turns a solver connection result into the JSON spectrum file (kind hexloom-spectrum, schema version 1). */
import { SPECTRUM_SCHEMA_VERSION, type SpectrumFile } from '@hexloom/contracts';
import { amplitudeDb, phaseRad, type ConnectionResult } from '@hexloom/solver';

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** The spectrum file of `result`; non-finite values (the dB of an exact zero) become null. */
export function toSpectrumFile(result: ConnectionResult): SpectrumFile {
  const s = result.spectrum;
  const db = amplitudeDb(s);
  const ph = phaseRad(s);
  return {
    schemaVersion: SPECTRUM_SCHEMA_VERSION,
    kind: 'hexloom-spectrum',
    from: result.from,
    to: result.to,
    referenceFrequencyHz: s.referenceFrequencyHz,
    unitDelayS: s.unitDelayS,
    method: s.method,
    run: result.run,
    powerBalance: result.powerBalance,
    points: {
      frequencyHz: Array.from(s.offsetsHz, (f) => s.referenceFrequencyHz + f),
      offsetHz: Array.from(s.offsetsHz),
      amplitudeDb: Array.from(db, finiteOrNull),
      phaseDeg: Array.from(ph, (p) => (p * 180) / Math.PI),
      groupDelayPs: Array.from(s.groupDelayS, (t) => finiteOrNull(t * 1e12)),
      dispersionPsPerNm: Array.from(s.dispersionPsPerNm, finiteOrNull),
      re: Array.from(s.re),
      im: Array.from(s.im),
    },
  };
}
