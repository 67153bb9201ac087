/** CSV of a spectrum: Hexloom's writer, and a reader that also takes a bench's measured columns. */
import type { Spectrum } from './spectrum.js';
import { amplitudeDb, phaseRad } from './spectrum.js';
import { SpectrumFileError } from './touchstone-format.js';

/** Columns written by {@link writeSpectrumCsv}, in order. */
export const SPECTRUM_CSV_COLUMNS = ['frequency_hz', 'offset_hz', 'amplitude_db', 'phase_deg', 'group_delay_ps', 'dispersion_ps_per_nm', 're', 'im'] as const;

const num = (x: number): string => (Number.isFinite(x) ? Number(x.toPrecision(12)).toString() : x > 0 ? 'inf' : x < 0 ? '-inf' : 'nan');

/** Writes `# ` comment lines, a header of {@link SPECTRUM_CSV_COLUMNS} and one row per frequency (RFC 4180 style, comma, LF). */
export function writeSpectrumCsv(s: Spectrum, comments: readonly string[] = []): string {
  const db = amplitudeDb(s), ph = phaseRad(s);
  const rows = [...comments.map((c) => `# ${c}`), SPECTRUM_CSV_COLUMNS.join(',')];
  s.offsetsHz.forEach((f, i) => {
    rows.push(
      [s.referenceFrequencyHz + f, f, db[i] ?? 0, ((ph[i] ?? 0) * 180) / Math.PI, (s.groupDelayS[i] ?? 0) * 1e12, s.dispersionPsPerNm[i] ?? 0, s.re[i] ?? 0, s.im[i] ?? 0]
        .map(num)
        .join(','),
    );
  });
  return `${rows.join('\n')}\n`;
}

/** A spectrum read from CSV: complex response where the file gives phase (or re/im), else magnitude only. */
export type MeasuredSpectrum = {
  frequenciesHz: Float64Array;
  amplitudeDb: Float64Array;
  /** Phase in radians, or null when the file has no phase. */
  phaseRad: Float64Array | null;
  /** Group delay in seconds, or null when the file has none. */
  groupDelayS: Float64Array | null;
};

/**
 * Reads a spectrum CSV: lines starting with `#` are comments; the header names the columns (any order,
 * case-insensitive). Needs a frequency (`frequency_hz` or `frequency_ghz`) and either `re` + `im` or
 * `amplitude_db` (with optional `phase_deg`); `group_delay_ps` is optional. Extra columns are ignored.
 * @throws SpectrumFileError naming the line and the reason (missing column, non-numeric cell, short row).
 */
export function readSpectrumCsv(text: string): MeasuredSpectrum {
  const lines = text.split(/\r?\n/);
  let header: string[] | null = null, headerLine = 0;
  const rows: { cells: string[]; line: number }[] = [];
  lines.forEach((raw, idx) => {
    const content = raw.trim();
    if (content === '' || content.startsWith('#')) return;
    const cells = content.split(',').map((c) => c.trim());
    if (header === null) { header = cells.map((c) => c.toLowerCase()); headerLine = idx + 1; }
    else rows.push({ cells, line: idx + 1 });
  });
  if (header === null) throw new SpectrumFileError(lines.length, 'no header line', 'csv');
  const cols: string[] = header;
  const col = (name: string): number => cols.indexOf(name);
  const fHz = col('frequency_hz'), fGhz = col('frequency_ghz');
  if (fHz < 0 && fGhz < 0) throw new SpectrumFileError(headerLine, 'the header needs a frequency_hz or frequency_ghz column', 'csv');
  const reC = col('re'), imC = col('im'), dbC = col('amplitude_db'), phC = col('phase_deg'), gdC = col('group_delay_ps');
  const complexGiven = reC >= 0 && imC >= 0;
  if (!complexGiven && dbC < 0) throw new SpectrumFileError(headerLine, 'the header needs amplitude_db, or re and im', 'csv');
  if (rows.length === 0) throw new SpectrumFileError(lines.length, 'no data rows', 'csv');
  const n = rows.length;
  const out: MeasuredSpectrum = {
    frequenciesHz: new Float64Array(n),
    amplitudeDb: new Float64Array(n),
    phaseRad: complexGiven || phC >= 0 ? new Float64Array(n) : null,
    groupDelayS: gdC >= 0 ? new Float64Array(n) : null,
  };
  rows.forEach(({ cells, line }, i) => {
    if (cells.length < cols.length) throw new SpectrumFileError(line, `expected ${cols.length} cells, got ${cells.length}`, 'csv');
    const cell = (c: number): number => {
      const text = cells[c] ?? '';
      const v = text === '-inf' ? -Infinity : Number(text);
      if (text === '' || Number.isNaN(v)) throw new SpectrumFileError(line, `column ${cols[c]} has "${text}", not a number`, 'csv');
      return v;
    };
    out.frequenciesHz[i] = fHz >= 0 ? cell(fHz) : cell(fGhz) * 1e9;
    if (i > 0 && !((out.frequenciesHz[i] ?? 0) > (out.frequenciesHz[i - 1] ?? 0))) throw new SpectrumFileError(line, 'frequencies must increase', 'csv');
    if (complexGiven) {
      const re = cell(reC), im = cell(imC);
      out.amplitudeDb[i] = 10 * Math.log10(re * re + im * im);
      (out.phaseRad as Float64Array)[i] = Math.atan2(im, re);
    } else {
      out.amplitudeDb[i] = cell(dbC);
      if (out.phaseRad) out.phaseRad[i] = (cell(phC) * Math.PI) / 180;
    }
    if (out.groupDelayS) out.groupDelayS[i] = cell(gdC) * 1e-12;
  });
  return out;
}
