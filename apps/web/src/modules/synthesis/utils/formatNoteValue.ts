// A realisation note's value in its unit ("9.87 GHz", "402.5 ps", "× 0.999", "4 gates").
import { formatNumber, formatQuantity } from '../../figures/utils/formatFigure.js';

const CATALOGUE_UNITS = new Set(['dB', 'Hz', 'ps', 'ps/GHz', '%']);

/** `value` in `unit`; units outside the figure catalogue are written after the number. */
export function formatNoteValue(value: number, unit: string): string {
  if (CATALOGUE_UNITS.has(unit)) return formatQuantity(value, unit as 'dB' | 'Hz' | 'ps' | 'ps/GHz' | '%');
  if (unit === 'x') return `× ${formatNumber(value)}`;
  return unit ? `${formatNumber(value)} ${unit}` : formatNumber(value);
}
