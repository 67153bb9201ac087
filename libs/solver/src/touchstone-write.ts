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

/**
 * dB written in DB format for a magnitude of zero or below 10^(-400/20) = 1e-20, dB: the file format has no
 * infinity (a bare number is required) and a reader turns -400 dB back into a magnitude of 1e-20.
 */
const TOUCHSTONE_DB_FLOOR = -400;

/** Significant digits of S values and of frequencies on ordinary spans. */
const VALUE_DIGITS = 12;
/** Enough digits to single out any double. */
const MAX_FREQUENCY_DIGITS = 17;
/** Digits beyond those that tell neighbouring frequencies apart: each written frequency is within 1/2000 of a step. */
const GUARD_DIGITS = 3;

const num = (x: number, digits = VALUE_DIGITS): string => (Object.is(x, -0) ? '0' : Number(x.toPrecision(digits)).toString());

/**
 * The frequencies of `frequenciesHz` (strictly increasing) as written in `unit`: 12 significant digits, more when the
 * smallest step relative to its frequency asks for it (resolution at most a thousandth of the step), up to 17.
 * Checked as the reader takes them back (number times the unit's scale): strictly increasing in Hz.
 * @throws SolverInputError when two frequencies cannot be told apart in `unit` even with 17 digits.
 */
function formatFrequencies(frequenciesHz: Float64Array, unit: TouchstoneFrequencyUnit): string[] {
  const scale = FREQUENCY_SCALE[unit];
  const inUnit = Array.from(frequenciesHz, (f) => f / scale);
  let digits = VALUE_DIGITS;
  for (let f = 1; f < inUnit.length; f++) {
    const lo = inUnit[f - 1] ?? 0, hi = inUnit[f] ?? 0;
    const magnitude = Math.max(Math.abs(lo), Math.abs(hi));
    // The leading digit of `magnitude` sits at 10^floor(log10 m); the step needs digits down to 10^(log10 step - 3).
    if (magnitude > 0) digits = Math.max(digits, Math.ceil(Math.floor(Math.log10(magnitude)) + 1 + GUARD_DIGITS - Math.log10(hi - lo)));
  }
  for (let d = Math.min(digits, MAX_FREQUENCY_DIGITS); ; d++) {
    const text = inUnit.map((x) => num(x, d));
    const clash = text.findIndex((t, f) => f > 0 && !(Number(t) * scale > Number(text[f - 1]) * scale));
    if (clash < 0) return text;
    if (d >= MAX_FREQUENCY_DIGITS) {
      throw new SolverInputError(
        `solver: Touchstone frequencies ${frequenciesHz[clash - 1]} and ${frequenciesHz[clash]} Hz cannot be told apart in ${unit} even with ${MAX_FREQUENCY_DIGITS} significant digits; write the file in HZ`,
      );
    }
  }
}

/**
 * Writes `# <unit> S <format> R <ohm>` and one record per frequency. Layout (IBIS Open Forum, Touchstone File
 * Format Specification 1.1 and 2.0): a 2-port record is one line in the order N11 N21 N12 N22; from 3 ports on,
 * every matrix row starts on a new line, row-major, with at most four pairs per line. Version 2.0 adds
 * `[Version] 2.0`, `[Number of Ports]`, `[Two-Port Data Order] 21_12` (2-port), `[Number of Frequencies]`,
 * `[Network Data]` and `[End]`. Frequencies must increase strictly, in the file too: they get as many significant
 * digits as the smallest step needs (12 to 17, see `formatFrequencies`). S values get 12 significant digits; in DB
 * format a magnitude of zero (or below 1e-20) is written as -400 dB (the floor, `TOUCHSTONE_DB_FLOOR`).
 * @throws SolverInputError on a bad port count or data length, non-finite S values, frequencies that do not
 * increase, or frequencies too close to tell apart in `frequencyUnit`.
 */
export function writeTouchstone(data: TouchstoneData, options: TouchstoneWriteOptions = {}): string {
  const { version = '1.1', format = 'MA', frequencyUnit = 'GHZ', comments = [] } = options;
  const n = data.portCount, fCount = data.frequenciesHz.length;
  if (!(Number.isInteger(n) && n >= 1)) throw new SolverInputError(`solver: portCount must be a positive integer, got ${n}`);
  if (data.re.length !== fCount * n * n || data.im.length !== fCount * n * n) {
    throw new SolverInputError(`solver: S data must hold ${fCount * n * n} values for ${n} ports and ${fCount} frequencies, got ${data.re.length}`);
  }
  for (let k = 0; k < data.re.length; k++) {
    if (!(Number.isFinite(data.re[k]) && Number.isFinite(data.im[k]))) {
      throw new SolverInputError(`solver: S values must be finite, got ${data.re[k]} + ${data.im[k]}j at flat index ${k}`);
    }
  }
  for (let f = 1; f < fCount; f++) {
    if (!((data.frequenciesHz[f] ?? 0) > (data.frequenciesHz[f - 1] ?? 0))) {
      throw new SolverInputError(`solver: Touchstone frequencies must increase strictly, got ${data.frequenciesHz[f - 1]} then ${data.frequenciesHz[f]} Hz`);
    }
  }
  const frequencies = formatFrequencies(data.frequenciesHz, frequencyUnit);
  // A comment stays one comment line: a newline or other control character in it could start an option line.
  const lines: string[] = comments.map((c) => `! ${c.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, ' ')}`);
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
    return format === 'MA' ? `${num(mag)} ${num(deg)}` : `${num(Math.max(20 * Math.log10(mag), TOUCHSTONE_DB_FLOOR))} ${num(deg)}`;
  };
  for (let f = 0; f < fCount; f++) {
    const freq = frequencies[f] ?? '';
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
