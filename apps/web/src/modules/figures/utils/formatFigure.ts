// Figures in words and units ("Insertion loss 17.98 dB", "3 dB bandwidth 1.29 GHz"), from the shared figure catalogue.
import { FIGURE_CATALOGUE, VERDICT_FIGURES, type FigureDefinition, type FigureUnit, type FilterSpecKind } from '@hexloom/contracts';

/** Figures of a whole response that no spec kind lists (Monte Carlo studies quote them). */
const RESPONSE_FIGURES: FigureDefinition[] = [
  { name: 'worstMarginDb', unit: 'dB', label: 'worst mask margin' },
  { name: 'peakFrequencyHz', unit: 'Hz', label: 'frequency of the highest transmission' },
];

/** The first definition of each name over every kind (a name's unit is the same in every kind). */
const DEFINITIONS = new Map<string, FigureDefinition>();
for (const d of [...Object.values(FIGURE_CATALOGUE).flat(), ...VERDICT_FIGURES, ...RESPONSE_FIGURES]) if (!DEFINITIONS.has(d.name)) DEFINITIONS.set(d.name, d);

/** A figure ready to show: a sentence-case label and the value with its unit. */
export type FormattedFigure = { name: string; label: string; text: string };

/** A number with a sensible count of digits for a reader (no exponent notation). */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return value > 0 ? '∞' : value < 0 ? '−∞' : '—';
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, Math.min(12, digits - 1 - magnitude));
  return value.toLocaleString('en-GB', { minimumFractionDigits: 0, maximumFractionDigits: decimals }).replace('-', '−');
}

/** A frequency in Hz written in the largest unit that keeps it readable (THz, GHz, MHz, kHz, Hz). */
export function formatFrequencyHz(hz: number): string {
  const a = Math.abs(hz);
  const [scale, unit] = a >= 1e12 ? [1e12, 'THz'] : a >= 1e9 ? [1e9, 'GHz'] : a >= 1e6 ? [1e6, 'MHz'] : a >= 1e3 ? [1e3, 'kHz'] : [1, 'Hz'];
  return `${formatNumber(hz / scale)} ${unit}`;
}

/** A value in one of the catalogue's units. */
export function formatQuantity(value: number, unit: FigureUnit | 'ps/GHz' | '%' | 'rad' | 'V' | 'mA' | 'mW' | 'W'): string {
  if (unit === 'Hz') return formatFrequencyHz(value);
  if (unit === 'count') return formatNumber(value);
  return `${formatNumber(value)} ${unit}`;
}

/**
 * `insertionLossDb`, `bandwidthHz@E09`... -> "Insertion loss at the carrier (E09)" and "17.98 dB"; with the spec's
 * `kind`, the label is that kind's own wording.
 */
export function formatFigure(name: string, value: number, kind?: FilterSpecKind): FormattedFigure {
  const [base = name, port] = name.split('@');
  const definition = (kind ? FIGURE_CATALOGUE[kind].find((d) => d.name === base) : undefined) ?? DEFINITIONS.get(base);
  const words = definition?.label ?? base.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  const label = `${words.charAt(0).toUpperCase()}${words.slice(1)}${port ? ` (${port})` : ''}`;
  const unit: FigureUnit = definition?.unit ?? (/Hz$/.test(base) ? 'Hz' : /Db$/.test(base) ? 'dB' : /Ps$/.test(base) ? 'ps' : 'count');
  return { name, label, text: formatQuantity(value, unit) };
}
