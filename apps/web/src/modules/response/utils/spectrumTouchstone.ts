// A 2-port Touchstone file of one plotted connection (S21 simulated, S12 by reciprocity).
import type { SpectrumFile } from '@hexloom/contracts';
import { writeTouchstone } from '@hexloom/solver';
import { pairLabel } from './pairLabel.js';

/**
 * Touchstone 1.1 text (IBIS Open Forum) of `file` as a 2-port, port 1 its input and port 2 its output: S21 is the
 * simulated response, S12 equals it because the mesh is reciprocal, and S11 and S22 are written as 0 because this
 * plot does not compute them (the comment lines say so; the S-parameter export of a version has the full matrix).
 */
export function spectrumTouchstone(file: SpectrumFile): string {
  const n = file.points.frequencyHz.length;
  const re = new Float64Array(4 * n), im = new Float64Array(4 * n);
  file.points.re.forEach((r, f) => {
    const s21 = 4 * f + 2, s12 = 4 * f + 1;
    re[s21] = r;
    re[s12] = r;
    im[s21] = file.points.im[f] ?? 0;
    im[s12] = file.points.im[f] ?? 0;
  });
  return writeTouchstone(
    { portCount: 2, frequenciesHz: Float64Array.from(file.points.frequencyHz), re, im, referenceOhm: 50 },
    { format: 'DB', comments: [`Hexloom connection ${pairLabel(file)}: port 1 = ${file.fromName}, port 2 = ${file.toName}`, 'S21 simulated; S12 = S21 (reciprocal mesh); S11 and S22 not computed for this plot, written as 0'] },
  );
}
