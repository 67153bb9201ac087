// Typed text to numbers at the edge of the form: blank or bad text becomes NaN, so the schema refuses it.

/** `text` times `scale` (e.g. GHz -> Hz with 1e9); NaN when blank or not a number. */
export function requiredNumber(text: string, scale = 1): number {
  const trimmed = text.trim();
  if (trimmed === '') return Number.NaN;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value * scale : Number.NaN;
}

/** Like requiredNumber, but blank text means "use the default" (undefined). */
export function optionalNumber(text: string, scale = 1): number | undefined {
  return text.trim() === '' ? undefined : requiredNumber(text, scale);
}

/** Comma- or space-separated numbers ("1, 2, 1"); a bad item becomes NaN. */
export function numberList(text: string): number[] {
  return text
    .split(/[\s,;]+/)
    .filter((item) => item !== '')
    .map((item) => requiredNumber(item));
}

/** A number written back into a field: at most 12 significant digits, no exponent for ordinary values. */
export function numberToText(value: number | undefined, scale = 1): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  return String(Number((value / scale).toPrecision(12)));
}
