/** The JSON spectrum file of a connection (`kind: "hexloom-spectrum"`): what `hexloom simulate` and the server answer. */
import type { ImpulseRunSummary } from './s-matrix.js';
import type { PowerBalance } from './power-balance.js';
import type { ConnectionResult } from './simulate-connection.js';
import { amplitudeDb, phaseRad, type Spectrum } from './spectrum.js';

/** Version of the spectrum file format (the zod schema `spectrumFileSchema` in libs/contracts checks the same shape). */
export const SPECTRUM_FILE_VERSION = 1;

/** Plain data of the spectrum file; non-finite values (the dB of an exact zero) are null. */
export type SpectrumFileData = {
  schemaVersion: typeof SPECTRUM_FILE_VERSION;
  kind: 'hexloom-spectrum';
  from: string;
  to: string;
  /** The chip's names of the two ports (their labels, else their ids). */
  fromName: string;
  toName: string;
  referenceFrequencyHz: number;
  unitDelayS: number;
  method: Spectrum['method'];
  run: ImpulseRunSummary;
  powerBalance: PowerBalance;
  points: {
    frequencyHz: number[];
    offsetHz: number[];
    amplitudeDb: (number | null)[];
    phaseDeg: number[];
    groupDelayPs: (number | null)[];
    dispersionPsPerNm: (number | null)[];
    re: number[];
    im: number[];
  };
};

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/**
 * The spectrum file of a simulated connection: absolute and offset frequencies, dB, degrees, ps, ps/nm, re/im.
 * `names` are the chip's names of the ports (labels); without them the ids stand in.
 */
export function toSpectrumFile(result: ConnectionResult, names?: { from: string; to: string }): SpectrumFileData {
  const s = result.spectrum;
  const db = amplitudeDb(s);
  const ph = phaseRad(s);
  return {
    schemaVersion: SPECTRUM_FILE_VERSION,
    kind: 'hexloom-spectrum',
    from: result.from,
    to: result.to,
    fromName: names?.from ?? result.from,
    toName: names?.to ?? result.to,
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
