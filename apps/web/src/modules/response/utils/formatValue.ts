// Numbers of the plots in words and units, never raw exponents ("−3.21 dB", "+2.000 GHz").

/** `value` with `decimals` decimals (more for small magnitudes, never an exponent), then the unit. */
export function formatValue(value: number | null | undefined, unit: string, decimals = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return 'no value';
  const magnitude = Math.abs(value);
  // Small values get enough decimals for three significant figures, written out in full (no exponent).
  const places = magnitude !== 0 && magnitude < 10 ** -decimals ? Math.min(15, Math.ceil(-Math.log10(magnitude)) + 2) : decimals;
  const text = value.toFixed(places);
  return `${text.replace('-', '−')} ${unit}`;
}

/** A frequency offset in GHz with its sign ("+2.000 GHz"). */
export function formatOffsetGhz(offsetGhz: number): string {
  const text = Math.abs(offsetGhz).toFixed(3);
  return `${offsetGhz < 0 ? '−' : '+'}${text} GHz`;
}
