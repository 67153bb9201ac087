/** Touchstone writer (.sNp), version 1.1 or 2.0, following the IBIS Open Forum specification's layout rules. */
import type { TouchstoneData, TouchstoneFormat, TouchstoneFrequencyUnit, TouchstoneVersion } from './touchstone-format.js';
import { FREQUENCY_SCALE } from './touchstone-format.js';
import { SolverInputError } from './unit-delay.js';

export type TouchstoneWriteOptions = {
  version?: TouchstoneVersion;
  format?: TouchstoneFormat;
  frequencyUnit?: TouchstoneFrequencyUnit;
  /** Comment lines written after `!` at the top. */
  comments?: readonly string[];
};

const num = (x: number): string => (Object.is(x, -0) ? '0' : Number(x.toPrecision(12)).toString());

/**
 * Writes `# <unit> S <format> R <ohm>` and one record per frequency. Layout (Touchstone 1.1 and 2.0):
 * a 2-port record is one line in the order N11 N21 N12 N22; from 3 ports on, every matrix row starts on a
 * new line, row-major, with at most four pairs per line. Version 2.0 adds `[Version] 2.0`,
 * `[Number of Ports]`, `[Two-Port Data Order] 21_12` (2-port), `[Number of Frequencies]`,
 * `[Network Data]` and `[End]`. Frequencies must increase strictly.
 */
export function writeTouchstone(data: TouchstoneData, options: TouchstoneWriteOptions = {}): string {
  const { version = '1.1', format = 'MA', frequencyUnit = 'GHZ', comments = [] } = options;
  const n = data.portCount, fCount = data.frequenciesHz.length;
  if (!(Number.isInteger(n) && n >= 1)) throw new SolverInputError(`solver: portCount must be a positive integer, got ${n}`);
  if (data.re.length !== fCount * n * n || data.im.length !== fCount * n * n) {
    throw new SolverInputError(`solver: S data must hold ${fCount * n * n} values for ${n} ports and ${fCount} frequencies, got ${data.re.length}`);
  }
  for (let f = 1; f < fCount; f++) {
    if (!((data.frequenciesHz[f] ?? 0) > (data.frequenciesHz[f - 1] ?? 0))) {
      throw new SolverInputError(`solver: Touchstone frequencies must increase strictly, got ${data.frequenciesHz[f - 1]} then ${data.frequenciesHz[f]} Hz`);
    }
  }
  const lines: string[] = comments.map((c) => `! ${c}`);
  if (version === '2.0') lines.push('[Version] 2.0');
  lines.push(`# ${frequencyUnit} S ${format} R ${num(data.referenceOhm)}`);
  if (version === '2.0') {
    lines.push(`[Number of Ports] ${n}`);
    if (n === 2) lines.push('[Two-Port Data Order] 21_12');
    lines.push(`[Number of Frequencies] ${fCount}`);
    lines.push('[Network Data]');
  }
  const pair = (f: number, i: number, j: number): string => {
    const k = (f * n + i) * n + j;
    const re = data.re[k] ?? 0, im = data.im[k] ?? 0;
    if (format === 'RI') return `${num(re)} ${num(im)}`;
    const mag = Math.hypot(re, im), deg = (Math.atan2(im, re) * 180) / Math.PI;
    return format === 'MA' ? `${num(mag)} ${num(deg)}` : `${num(20 * Math.log10(mag))} ${num(deg)}`;
  };
  for (let f = 0; f < fCount; f++) {
    const freq = num((data.frequenciesHz[f] ?? 0) / FREQUENCY_SCALE[frequencyUnit]);
    if (n === 1) lines.push(`${freq} ${pair(f, 0, 0)}`);
    else if (n === 2) lines.push(`${freq} ${pair(f, 0, 0)} ${pair(f, 1, 0)} ${pair(f, 0, 1)} ${pair(f, 1, 1)}`);
    else {
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j += 4) {
          const row = Array.from({ length: Math.min(4, n - j) }, (_, m) => pair(f, i, j + m)).join(' ');
          lines.push(i === 0 && j === 0 ? `${freq} ${row}` : row);
        }
      }
    }
  }
  if (version === '2.0') lines.push('[End]');
  return `${lines.join('\n')}\n`;
}
