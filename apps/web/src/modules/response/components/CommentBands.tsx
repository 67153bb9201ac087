// Frequency bands that review comments point at, shaded on the chart with the comment's words on hover.
import type { ScaleLinear } from 'd3';
import { PLOT_AREA } from './plotLayout.js';

/** A band in Hz from the carrier and what the comment says. */
export type CommentBand = { fromHz: number; toHz: number; label: string };

/** A hatched band per comment, under the traces; its `<title>` carries the comment text. */
export function CommentBands({ bands, x }: { bands: readonly CommentBand[]; x: ScaleLinear<number, number> }) {
  const clampX = (v: number): number => Math.min(PLOT_AREA.x1, Math.max(PLOT_AREA.x0, x(v)));
  return (
    <g className="hx-rp-comments" data-testid="comment-bands">
      {bands.map((b, i) => {
        const x0 = clampX(b.fromHz / 1e9);
        const x1 = clampX(b.toHz / 1e9);
        return (
          <rect key={i} className="hx-rp-comment-band" data-testid="comment-band" x={x0} width={Math.max(2, x1 - x0)} y={PLOT_AREA.y0} height={PLOT_AREA.y1 - PLOT_AREA.y0}>
            <title>{`Comment: ${b.label}`}</title>
          </rect>
        );
      })}
    </g>
  );
}
