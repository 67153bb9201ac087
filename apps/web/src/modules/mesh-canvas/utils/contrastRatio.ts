// The WCAG 2.1 contrast ratio of two sRGB colours.

/** Relative luminance of a `#rrggbb` colour (WCAG 2.1, "relative luminance"). */
function luminance(hex: string): number {
  const channel = (i: number) => {
    const v = parseInt(hex.slice(i, i + 2), 16) / 255;
    return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(1) + 0.7152 * channel(3) + 0.0722 * channel(5);
}

/** (L1 + 0.05) / (L2 + 0.05) with L1 the lighter colour, from 1 to 21 (WCAG 2.1, "contrast ratio"). */
export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}
