// Sorting of the gate table by one column, either way.
import type { GateRow } from './gateRows.js';

export type GateSort = { key: keyof GateRow; descending: boolean };

/** A sorted copy (numbers numerically, text alphabetically with digits in order); the input is not mutated. */
export function sortGateRows(rows: readonly GateRow[], sort: GateSort): GateRow[] {
  const sign = sort.descending ? -1 : 1;
  return [...rows].sort((a, b) => {
    const x = a[sort.key];
    const y = b[sort.key];
    const order = typeof x === 'number' && typeof y === 'number' ? x - y : String(x).localeCompare(String(y), 'en', { numeric: true });
    return sign * order;
  });
}
