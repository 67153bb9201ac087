// Coefficients typed as "1, 0.5+0.2j, -0.3j" to { re, im } pairs, and back.

const COMPLEX = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)?(?:([+-](?:\d+\.?\d*|\.\d+)?(?:e[+-]?\d+)?)[ij])?$/i;

/** Parses comma-separated real or complex numbers ("a", "a+bj", "bj"); an unreadable item becomes NaN + 0j. */
export function complexList(text: string): { re: number; im: number }[] {
  return text
    .split(/[,;]+/)
    .map((item) => item.replace(/\s+/g, ''))
    .filter((item) => item !== '')
    .map((item) => {
      const onlyImaginary = /^[+-]?(?:\d+\.?\d*|\.\d+)?(?:e[+-]?\d+)?[ij]$/i.test(item);
      const match = onlyImaginary ? null : COMPLEX.exec(item);
      if (onlyImaginary) return { re: 0, im: imaginaryPart(item.slice(0, -1)) };
      if (!match || (match[1] === undefined && match[2] === undefined)) return { re: Number.NaN, im: 0 };
      return { re: match[1] === undefined ? 0 : Number(match[1]), im: match[2] === undefined ? 0 : imaginaryPart(match[2]) };
    });
}

/** "+" or "-" alone mean one. */
function imaginaryPart(text: string): number {
  if (text === '' || text === '+') return 1;
  if (text === '-') return -1;
  return Number(text);
}

/** The inverse of complexList, for prefilling the field. */
export function complexListText(values: readonly { re: number; im?: number | undefined }[]): string {
  return values
    .map(({ re, im = 0 }) => {
      if (im === 0) return String(re);
      const sign = im < 0 ? '-' : '+';
      return `${re === 0 ? (im < 0 ? '-' : '') : `${re}${sign}`}${Math.abs(im)}j`;
    })
    .join(', ');
}
