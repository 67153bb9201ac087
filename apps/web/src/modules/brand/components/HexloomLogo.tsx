// The Hexloom mark: a hexagon woven from three strands that fold inwards into a triangle around an amber centre.

/** Strand paths in a 64 x 64 box: each runs along two hexagon edges, then folds back across the cell. */
const STRANDS = [
  'M11.2 20 L32 8 L52.8 20 L37.8 45.9',
  'M52.8 20 L52.8 44 L32 56 L17 30.1',
  'M32 56 L11.2 44 L11.2 20 L41.1 20',
] as const;
/** The first half-edge of strand one, drawn again last so every strand passes over its neighbour once. */
const WEAVE_CLOSER = 'M11.2 20 L21.6 14';
const STRAND_COLOURS = ['var(--hx-logo-1)', 'var(--hx-logo-2)', 'var(--hx-logo-3)'] as const;

export type HexloomLogoProps = {
  /** Width and height in CSS pixels. */
  sizePx?: number;
  /** Colour of the gaps where strands cross (the surface behind the logo). */
  gapColour?: string;
  /** Accessible name; omit for a decorative logo next to the product name. */
  title?: string;
};

/** The Hexloom logo as inline SVG. */
export function HexloomLogo({ sizePx = 32, gapColour = 'var(--hx-surface)', title }: HexloomLogoProps) {
  const strand = (d: string, colour: string, key: string) => (
    <g key={key}>
      <path d={d} stroke={gapColour} strokeWidth={10} />
      <path d={d} stroke={colour} strokeWidth={6} />
    </g>
  );
  return (
    <svg
      width={sizePx}
      height={sizePx}
      viewBox="0 0 64 64"
      fill="none"
      strokeLinecap="round"
      strokeLinejoin="round"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      data-testid="hexloom-logo"
    >
      {title ? <title>{title}</title> : null}
      {STRANDS.map((d, i) => strand(d, STRAND_COLOURS[i] ?? 'currentColor', `s${i}`))}
      {strand(WEAVE_CLOSER, STRAND_COLOURS[0], 'closer')}
      <circle cx={32} cy={32} r={4.2} fill="var(--hx-amber-500)" />
    </svg>
  );
}
