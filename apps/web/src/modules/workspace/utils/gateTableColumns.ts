// The columns of the gate table: header in words with the unit, and how each value is written.
import type { GateRow } from './gateRows.js';

export type GateColumn = { key: keyof GateRow; name: string; text: (row: GateRow) => string };

const fixed = (digits: number) => (x: number) => x.toFixed(digits);

/** Gate, state, circuit, kappa, theta and phi (rad), drive voltages (V), current (mA), power (mW), source. */
export const GATE_TABLE_COLUMNS: GateColumn[] = [
  { key: 'gate', name: 'Gate', text: (r) => r.gate },
  { key: 'state', name: 'State', text: (r) => r.state },
  { key: 'circuit', name: 'Circuit', text: (r) => r.circuit || '—' },
  { key: 'kappa', name: 'κ (cross power)', text: (r) => fixed(4)(r.kappa) },
  { key: 'thetaRad', name: 'θ (rad)', text: (r) => fixed(4)(r.thetaRad) },
  { key: 'phiRad', name: 'φ (rad)', text: (r) => fixed(4)(r.phiRad) },
  { key: 'thetaVoltageV', name: 'θ drive (V)', text: (r) => fixed(3)(r.thetaVoltageV) },
  { key: 'phiVoltageV', name: 'φ drive (V)', text: (r) => fixed(3)(r.phiVoltageV) },
  { key: 'currentA', name: 'Current (mA)', text: (r) => fixed(2)(r.currentA * 1e3) },
  { key: 'powerW', name: 'Power (mW)', text: (r) => fixed(2)(r.powerW * 1e3) },
  { key: 'source', name: 'Drive from', text: (r) => r.source },
];

/** The whole table as tab-separated text (header first), for the clipboard or a spreadsheet. */
export function gateTableTsv(rows: readonly GateRow[]): string {
  return [GATE_TABLE_COLUMNS.map((c) => c.name), ...rows.map((r) => GATE_TABLE_COLUMNS.map((c) => c.text(r)))].map((line) => line.join('\t')).join('\n');
}
