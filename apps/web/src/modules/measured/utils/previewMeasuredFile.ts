// Reads a measured CSV or Touchstone file in the browser, as the server will, for a preview before upload.
import { readSpectrumCsv, readTouchstone } from '@hexloom/solver';
import { formatFrequencyHz } from '../../figures/utils/formatFigure.js';
import { fileIssue, type MeasuredFileIssue } from './fileIssue.js';

/** One measured point: absolute optical frequency, Hz, and power, dB. */
export type MeasuredPoint = { frequencyHz: number; powerDb: number };

/** What the preview shows: the first rows, the point count and span, and what was detected in the file. */
export type MeasuredFilePreview = {
  format: 'csv' | 'touchstone';
  pointCount: number;
  firstRows: MeasuredPoint[];
  startHz: number;
  stopHz: number;
  /** Ports in the file (Touchstone), or null for a CSV of one connection. */
  portCount: number | null;
  /** Detected columns, units and options, in words. */
  detected: { label: string; value: string }[];
};

export type MeasuredFileCheck = { ok: true; preview: MeasuredFilePreview } | { ok: false; issues: MeasuredFileIssue[] };

/** Upload limit of the measurement route, bytes (2 MiB). */
export const MAX_MEASURED_BYTES = 2 * 1024 * 1024;
/** The server refuses points further than this from the chip's reference frequency, Hz (GHz given as Hz, say). */
export const MAX_DISTANCE_FROM_REFERENCE_HZ = 20e12;
const PREVIEW_ROWS = 8;
const UNIT_WORDS: Record<string, string> = { HZ: 'Hz', KHZ: 'kHz', MHZ: 'MHz', GHZ: 'GHz' };

const CSV_NAME = /\.csv$/i;
const TOUCHSTONE_NAME = /\.s(\d{1,2})p$/i;

/** The frequency unit on the option line of a Touchstone file (GHz when none, Touchstone 1.1 default). */
function touchstoneUnit(text: string): string {
  for (const line of text.split(/\r?\n/)) {
    const content = (line.split('!')[0] ?? '').trim();
    if (!content.startsWith('#')) continue;
    const unit = content.slice(1).trim().toUpperCase().split(/\s+/).find((t) => t in UNIT_WORDS);
    return unit ? (UNIT_WORDS[unit] ?? 'GHz') : 'GHz';
  }
  return 'GHz';
}

function readCsv(text: string): Omit<MeasuredFilePreview, 'pointCount' | 'firstRows' | 'startHz' | 'stopHz'> & { points: MeasuredPoint[] } {
  const s = readSpectrumCsv(text);
  const header = text.split(/\r?\n/).map((l) => l.trim()).find((l) => l !== '' && !l.startsWith('#')) ?? '';
  const columns = header.split(',').map((c) => c.trim().toLowerCase());
  const complex = columns.includes('re') && columns.includes('im');
  return {
    format: 'csv',
    portCount: null,
    detected: [
      { label: 'Frequency column', value: columns.includes('frequency_hz') ? 'frequency_hz, in Hz' : 'frequency_ghz, in GHz' },
      { label: 'Power', value: complex ? 'from re and im (complex amplitude), shown in dB' : 'amplitude_db, in dB' },
      { label: 'Phase', value: s.phaseRad ? 'given' : 'not given' },
    ],
    points: Array.from(s.frequenciesHz, (f, i) => ({ frequencyHz: f, powerDb: s.amplitudeDb[i] ?? Number.NaN })),
  };
}

function readSnp(text: string, fileName: string): ReturnType<typeof readCsv> {
  const t = readTouchstone(text, { fileName });
  const n = t.portCount;
  // As the server reads it: S21 (port 1 = from, port 2 = to), or S11 for a one-port.
  const [i, j] = n >= 2 ? [1, 0] : [0, 0];
  return {
    format: 'touchstone',
    portCount: n,
    detected: [
      { label: 'Touchstone version', value: t.version },
      { label: 'Frequency unit', value: touchstoneUnit(text) },
      { label: 'Data format', value: t.format === 'RI' ? 'real and imaginary' : t.format === 'DB' ? 'dB and angle' : 'magnitude and angle' },
      { label: 'Reference impedance', value: `${t.referenceOhm} Ω` },
      { label: 'Power read', value: n >= 2 ? '|S21| in dB (port 1 is the From port, port 2 the To port)' : '|S11| in dB' },
    ],
    points: Array.from(t.frequenciesHz, (f, k) => {
      const idx = (k * n + i) * n + j;
      return { frequencyHz: f, powerDb: 20 * Math.log10(Math.hypot(t.re[idx] ?? 0, t.im[idx] ?? 0)) };
    }),
  };
}

/**
 * Checks a measured file as the measurement route will: the name (.csv or .sNp), the size, the readers of
 * libs/solver (first error with its line), at least two points and frequencies near the chip's reference.
 */
export function previewMeasuredFile(text: string, fileName: string, sizeBytes: number, referenceFrequencyHz: number): MeasuredFileCheck {
  if (!CSV_NAME.test(fileName) && !TOUCHSTONE_NAME.test(fileName)) return { ok: false, issues: [{ line: null, reason: `"${fileName}" is neither a spectrum CSV (.csv) nor a Touchstone file (.s2p, .s1p…)` }] };
  if (sizeBytes > MAX_MEASURED_BYTES) return { ok: false, issues: [{ line: null, reason: `the file has ${(sizeBytes / 1048576).toFixed(1)} MiB; at most 2 MiB are accepted` }] };
  let read: ReturnType<typeof readCsv>;
  try {
    read = CSV_NAME.test(fileName) ? readCsv(text) : readSnp(text, fileName);
  } catch (error) {
    return { ok: false, issues: [fileIssue(error)] };
  }
  const { points, ...rest } = read;
  if (points.length < 2) return { ok: false, issues: [{ line: null, reason: `only ${points.length} point(s); at least 2 are needed` }] };
  const far = points.findIndex((p) => !(Math.abs(p.frequencyHz - referenceFrequencyHz) <= MAX_DISTANCE_FROM_REFERENCE_HZ));
  if (far >= 0) {
    return { ok: false, issues: [{ line: null, reason: `point ${far + 1} is at ${formatFrequencyHz(points[far]?.frequencyHz ?? 0)}, more than 20 THz from the chip's carrier; the file must give absolute optical frequencies` }] };
  }
  return {
    ok: true,
    preview: { ...rest, pointCount: points.length, firstRows: points.slice(0, PREVIEW_ROWS), startHz: points[0]?.frequencyHz ?? 0, stopHz: points[points.length - 1]?.frequencyHz ?? 0 },
  };
}
