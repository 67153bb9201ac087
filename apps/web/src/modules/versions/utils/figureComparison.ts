// Figures of each circuit in two versions side by side, in words, with the change from A to B.
import type { CircuitFigures, FilterSpecKind } from '@hexloom/contracts';
import { formatFigure } from '../../figures/utils/formatFigure.js';

/** One figure of one circuit: its label, its value in A and in B, and the change, all in words. */
export type FigureComparisonRow = { name: string; label: string; before: string; after: string; change: string; changed: boolean };

/** The rows of one circuit that has figures in A, in B or in both. */
export type CircuitFigureComparison = { circuitId: string; rows: FigureComparisonRow[] };

const MISSING = '—';

function changeText(name: string, before: number | undefined, after: number | undefined, kind: FilterSpecKind | undefined): string {
  if (before === undefined) return 'new in B';
  if (after === undefined) return 'not in B';
  const delta = after - before;
  if (delta === 0) return 'no change';
  const magnitude = formatFigure(name, Math.abs(delta), kind).text;
  return `${delta > 0 ? '+' : '−'}${magnitude}`;
}

/**
 * Every circuit with figures in either version (A's order, then B's new ones), each figure's values and the change
 * B − A ("+1.2 dB", "no change", "new in B"). `kindOf` names the circuit's spec kind for the kind's own wording.
 */
export function figureComparison(a: CircuitFigures, b: CircuitFigures, kindOf: (circuitId: string) => FilterSpecKind | undefined): CircuitFigureComparison[] {
  const circuits = [...new Set([...Object.keys(a), ...Object.keys(b)])];
  return circuits.map((circuitId) => {
    const before = a[circuitId] ?? {};
    const after = b[circuitId] ?? {};
    const kind = kindOf(circuitId);
    const names = [...new Set([...Object.keys(before), ...Object.keys(after)])];
    const rows = names.map((name): FigureComparisonRow => {
      const x = before[name];
      const y = after[name];
      const shown = formatFigure(name, x ?? y ?? 0, kind);
      return {
        name,
        label: shown.label,
        before: x === undefined ? MISSING : formatFigure(name, x, kind).text,
        after: y === undefined ? MISSING : formatFigure(name, y, kind).text,
        change: changeText(name, x, y, kind),
        changed: x !== y,
      };
    });
    return { circuitId, rows };
  });
}
