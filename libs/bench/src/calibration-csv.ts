/** Reads the calibration CSV (one row per phase shifter) with line-numbered errors; nothing partial is returned. */
import Papa from 'papaparse';
import { shifterKey, type ShifterCalibration, type ShifterKind } from './shifter-calibration.js';

/** Columns of the calibration CSV, in order (powers in mW, as benches quote them). */
export const CALIBRATION_COLUMNS = ['gate', 'shifter', 'offset_rad', 'p_pi_mw', 'resistance_ohm', 'max_power_mw', 'max_voltage_v'] as const;

/** Accepted ranges of the numeric columns, in the CSV's own units. */
export const CALIBRATION_COLUMN_RANGES: Readonly<Record<Exclude<(typeof CALIBRATION_COLUMNS)[number], 'gate' | 'shifter'>, { min: number; max: number }>> = {
  offset_rad: { min: -2 * Math.PI, max: 2 * Math.PI },
  p_pi_mw: { min: 0.1, max: 1000 },
  resistance_ohm: { min: 1, max: 1e6 },
  max_power_mw: { min: 0.1, max: 2000 },
  max_voltage_v: { min: 0.1, max: 100 },
};

/** One problem of a calibration file: the 1-based line, the column when known, and why. */
export type CalibrationIssue = { readonly line: number; readonly column: string | null; readonly reason: string };

/** A calibration file that cannot be used; `issues` lists every bad row, in line order. */
export class CalibrationCsvError extends Error {
  override readonly name = 'CalibrationCsvError';
  constructor(readonly issues: readonly CalibrationIssue[]) {
    super(`calibration CSV: ${issues.map((i) => `line ${i.line}${i.column ? ` (${i.column})` : ''}: ${i.reason}`).join('; ')}`);
  }
}

/** Options: the gate ids of the chip, so rows naming other gates are refused. */
export type CalibrationCsvOptions = { readonly knownGates?: ReadonlySet<string> | undefined };

const GATE_ID = /^g\(-?\d+,-?\d+\)(e|ne|nw)$/;

/**
 * Parses the calibration CSV (RFC 4180; gate ids hold a comma, so they are quoted): `#` lines are comments, the first other line must be the header
 * {@link CALIBRATION_COLUMNS} (any order, case-insensitive), then one row per shifter. Every row is checked
 * (gate id, shifter theta/phi, numbers finite and within {@link CALIBRATION_COLUMN_RANGES}, no duplicates).
 * @returns the shifters in SI units (W, ohm, V, rad).
 * @throws CalibrationCsvError listing each bad line.
 */
export function parseCalibrationCsv(text: string, options: CalibrationCsvOptions = {}): ShifterCalibration[] {
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false });
  const issues: CalibrationIssue[] = [];
  for (const e of parsed.errors) issues.push({ line: (e.row ?? 0) + 1, column: null, reason: e.message });
  let header: string[] | null = null;
  let headerLine = 0;
  const out: ShifterCalibration[] = [];
  const seen = new Map<string, number>();
  parsed.data.forEach((cells, index) => {
    const line = index + 1;
    const first = (cells[0] ?? '').trim();
    if (cells.every((c) => c.trim() === '') || first.startsWith('#')) return;
    if (header === null) {
      header = cells.map((c) => c.trim().toLowerCase());
      headerLine = line;
      const missing = CALIBRATION_COLUMNS.filter((c) => !header?.includes(c));
      if (missing.length > 0) issues.push({ line, column: null, reason: `the header lacks column(s) ${missing.join(', ')}` });
      return;
    }
    if (issues.some((i) => i.line === headerLine)) return;
    const cols = header;
    if (cells.length !== cols.length) {
      const unquoted = cells.some((c) => /^\s*g\(-?\d+$/.test(c));
      issues.push({ line, column: null, reason: `expected ${cols.length} cells, got ${cells.length}${unquoted ? ' (gate ids hold a comma: quote them, "g(0,0)e")' : ''}` });
      return;
    }
    const cell = (name: string): string => (cells[cols.indexOf(name)] ?? '').trim();
    const rowIssues: CalibrationIssue[] = [];
    const gate = cell('gate');
    if (!GATE_ID.test(gate)) rowIssues.push({ line, column: 'gate', reason: `"${gate}" is not a gate id g(q,r)e, g(q,r)ne or g(q,r)nw` });
    else if (options.knownGates && !options.knownGates.has(gate)) rowIssues.push({ line, column: 'gate', reason: `gate ${gate} is not a gate of this chip` });
    const shifter = cell('shifter');
    if (shifter !== 'theta' && shifter !== 'phi') rowIssues.push({ line, column: 'shifter', reason: `"${shifter}" is not theta or phi` });
    const numbers: Record<string, number> = {};
    for (const [name, range] of Object.entries(CALIBRATION_COLUMN_RANGES)) {
      const raw = cell(name);
      const value = raw === '' ? Number.NaN : Number(raw);
      if (!Number.isFinite(value)) rowIssues.push({ line, column: name, reason: `"${raw}" is not a finite number` });
      else if (value < range.min || value > range.max) rowIssues.push({ line, column: name, reason: `${value} is outside ${range.min} .. ${range.max}` });
      else numbers[name] = value;
    }
    if (rowIssues.length === 0) {
      const key = shifterKey(gate, shifter as ShifterKind);
      const earlier = seen.get(key);
      if (earlier !== undefined) rowIssues.push({ line, column: null, reason: `shifter ${key} is already given on line ${earlier}` });
      seen.set(key, line);
    }
    if (rowIssues.length > 0) {
      issues.push(...rowIssues);
      return;
    }
    out.push({
      gate,
      shifter: shifter as ShifterKind,
      offsetRad: numbers['offset_rad'] as number,
      piPowerW: (numbers['p_pi_mw'] as number) / 1000,
      resistanceOhm: numbers['resistance_ohm'] as number,
      maxPowerW: (numbers['max_power_mw'] as number) / 1000,
      maxVoltageV: numbers['max_voltage_v'] as number,
    });
  });
  if (header === null) issues.push({ line: 1, column: null, reason: 'no header line' });
  else if (out.length === 0 && issues.length === 0) issues.push({ line: headerLine, column: null, reason: 'no data rows after the header' });
  if (issues.length > 0) throw new CalibrationCsvError([...issues].sort((a, b) => a.line - b.line));
  return out;
}

/** Writes shifters back as a calibration CSV (the format {@link parseCalibrationCsv} reads). */
export function writeCalibrationCsv(shifters: readonly ShifterCalibration[], comments: readonly string[] = []): string {
  const num = (x: number): string => Number(x.toPrecision(12)).toString();
  const rows = [...comments.map((c) => `# ${c}`), CALIBRATION_COLUMNS.join(',')];
  for (const s of shifters) {
    rows.push([`"${s.gate}"`, s.shifter, num(s.offsetRad), num(s.piPowerW * 1000), num(s.resistanceOhm), num(s.maxPowerW * 1000), num(s.maxVoltageV)].join(','));
  }
  return `${rows.join('\n')}\n`;
}
