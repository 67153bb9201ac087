/** Touchstone reader (.sNp, versions 1.1 and 2.0) for measured bench data, with line-numbered errors. */
import type { TouchstoneData, TouchstoneFormat, TouchstoneFrequencyUnit, TouchstoneVersion } from './touchstone-format.js';
import { FREQUENCY_SCALE, SpectrumFileError } from './touchstone-format.js';

export type TouchstoneReadOptions = {
  /** File name; a version 1.1 file takes its port count from the `.sNp` extension. */
  fileName?: string;
  /** Port count, when there is no file name (version 1.1). */
  portCount?: number;
};

export type TouchstoneFile = TouchstoneData & { version: TouchstoneVersion; format: TouchstoneFormat };

/**
 * Reads a Touchstone file. Comments run from `!` to the end of the line; the option line defaults are
 * `# GHZ S MA R 50` (Touchstone 1.1 sec. "Option line"); only S-parameters are read. A 2-port record is
 * N11 N21 N12 N22 unless a version 2.0 file says `[Two-Port Data Order] 12_21`; records may wrap lines.
 * @throws SpectrumFileError naming the line and the reason.
 */
export function readTouchstone(text: string, options: TouchstoneReadOptions = {}): TouchstoneFile {
  const raw = text.split(/\r?\n/);
  let version = '1.1' as TouchstoneVersion;
  let unit = 'GHZ' as TouchstoneFrequencyUnit, format = 'MA' as TouchstoneFormat, referenceOhm = 50;
  let n = portsFromName(options) ?? 0;
  let order: '21_12' | '12_21' = '21_12';
  let declaredFreqs: number | null = null, optionSeen = false, ended = false, inData = true;
  const values: { v: number; line: number }[] = [];
  raw.forEach((full, idx) => {
    const line = idx + 1;
    const content = (full.split('!')[0] ?? '').trim();
    if (content === '' || ended) return;
    if (content.startsWith('[')) {
      const m = /^\[([^\]]+)\]\s*(.*)$/.exec(content);
      if (!m) throw new SpectrumFileError(line, `malformed keyword "${content}"`);
      const key = (m[1] ?? '').toLowerCase(), arg = (m[2] ?? '').trim();
      if (key === 'version') {
        if (arg !== '2.0' && arg !== '2.1') throw new SpectrumFileError(line, `unsupported [Version] "${arg}" (expected 2.0)`);
        version = '2.0';
        inData = false;
      } else if (key === 'number of ports') {
        n = Number(arg);
        if (!(Number.isInteger(n) && n >= 1)) throw new SpectrumFileError(line, `[Number of Ports] must be a positive integer, got "${arg}"`);
      } else if (key === 'two-port data order') {
        if (arg !== '21_12' && arg !== '12_21') throw new SpectrumFileError(line, `[Two-Port Data Order] must be 21_12 or 12_21, got "${arg}"`);
        order = arg;
      } else if (key === 'number of frequencies') {
        declaredFreqs = Number(arg);
        if (!(Number.isInteger(declaredFreqs) && declaredFreqs >= 1)) throw new SpectrumFileError(line, `[Number of Frequencies] must be a positive integer, got "${arg}"`);
      } else if (key === 'network data') inData = true;
      else if (key === 'end') ended = true;
      else if (key === 'reference') {
        const first = Number(arg.split(/\s+/)[0]);
        if (Number.isFinite(first) && first > 0) referenceOhm = first;
      }
      return;
    }
    if (content.startsWith('#')) {
      if (optionSeen) {
        if (version === '2.0') throw new SpectrumFileError(line, 'a second option line (only one is allowed)');
        return; // version 1.1: later option lines are ignored
      }
      optionSeen = true;
      const tokens = content.slice(1).trim().toUpperCase().split(/\s+/).filter(Boolean);
      for (let i = 0; i < tokens.length; i++) {
        const t = tokens[i] ?? '';
        if (t in FREQUENCY_SCALE) unit = t as TouchstoneFrequencyUnit;
        else if (t === 'MA' || t === 'DB' || t === 'RI') format = t;
        else if (t === 'S') continue;
        else if (t === 'Y' || t === 'Z' || t === 'H' || t === 'G') throw new SpectrumFileError(line, `only S-parameters are read, the option line says ${t}`);
        else if (t === 'R') {
          referenceOhm = Number(tokens[++i]);
          if (!(Number.isFinite(referenceOhm) && referenceOhm > 0)) throw new SpectrumFileError(line, `reference resistance after R must be a positive number, got "${tokens[i] ?? ''}"`);
        } else throw new SpectrumFileError(line, `unknown option "${t}" in the option line`);
      }
      return;
    }
    if (!inData) throw new SpectrumFileError(line, 'data before [Network Data]');
    for (const token of content.split(/\s+/)) {
      const v = Number(token);
      if (!Number.isFinite(v)) throw new SpectrumFileError(line, `"${token}" is not a number`);
      values.push({ v, line });
    }
  });
  if (version === '2.0' && !ended) throw new SpectrumFileError(raw.length, 'missing [End]');
  if (n < 1) throw new SpectrumFileError(1, 'unknown port count: give a .sNp file name or a [Number of Ports] keyword');
  const perRecord = 1 + 2 * n * n;
  if (values.length === 0) throw new SpectrumFileError(raw.length, 'no network data');
  if (values.length % perRecord !== 0) {
    const last = values[values.length - 1]?.line ?? raw.length;
    throw new SpectrumFileError(last, `incomplete record: ${n}-port data needs ${perRecord} numbers per frequency, ${values.length % perRecord} left over`);
  }
  const fCount = values.length / perRecord;
  if (declaredFreqs !== null && declaredFreqs !== fCount) {
    throw new SpectrumFileError(values[values.length - 1]?.line ?? raw.length, `[Number of Frequencies] says ${declaredFreqs}, the data hold ${fCount}`);
  }
  const frequenciesHz = new Float64Array(fCount), re = new Float64Array(fCount * n * n), im = new Float64Array(fCount * n * n);
  for (let f = 0; f < fCount; f++) {
    const base = f * perRecord;
    const freq = values[base] as { v: number; line: number };
    frequenciesHz[f] = freq.v * FREQUENCY_SCALE[unit];
    if (f > 0 && !((frequenciesHz[f] ?? 0) > (frequenciesHz[f - 1] ?? 0))) throw new SpectrumFileError(freq.line, `frequency ${freq.v} does not increase`);
    for (let m = 0; m < n * n; m++) {
      let i = Math.floor(m / n), j = m % n;
      if (n === 2 && order === '21_12') [i, j] = [m % 2, Math.floor(m / 2)];
      const a = values[base + 1 + 2 * m]?.v ?? 0, b = values[base + 2 + 2 * m]?.v ?? 0;
      const k = (f * n + i) * n + j;
      if (format === 'RI') { re[k] = a; im[k] = b; }
      else {
        const mag = format === 'MA' ? a : 10 ** (a / 20), rad = (b * Math.PI) / 180;
        re[k] = mag * Math.cos(rad);
        im[k] = mag * Math.sin(rad);
      }
    }
  }
  return { version, format, portCount: n, frequenciesHz, re, im, referenceOhm };
}

function portsFromName(options: TouchstoneReadOptions): number | null {
  if (options.portCount !== undefined) return options.portCount;
  const m = options.fileName ? /\.s(\d+)p$/i.exec(options.fileName) : null;
  return m ? Number(m[1]) : null;
}
