// Legend of the overlaid port pairs: one colour swatch and "W11 → E14" per trace.

type Props = { labels: readonly string[] };

/** The legend as a list, coloured as the traces are. */
export function PlotLegend({ labels }: Props) {
  return (
    <ul className="hx-rp-legend" aria-label="Legend" data-testid="plot-legend">
      {labels.map((label, i) => (
        <li key={i}>
          <span className={`hx-rp-swatch hx-rp-swatch-${i % 6}`} aria-hidden="true" />
          {label}
        </li>
      ))}
    </ul>
  );
}
