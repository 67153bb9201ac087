// Axes of the response chart: grid, ticks and labels in words and units, and the optional wavelength axis on top.
import type { ScaleLinear } from 'd3';
import { scaleLinear } from 'd3';
import { PLOT_AREA, PLOT_HEIGHT } from './plotLayout.js';

type Props = {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  xLabel: string;
  yLabel: string;
  /** Offset (GHz) to wavelength (nm) and back, when the wavelength axis is shown. */
  wavelength?: { toNm: (offsetGhz: number) => number; fromNm: (nm: number) => number };
};

const tick = (t: number): string => {
  const text = Math.abs(t) < 1e-12 ? '0' : Number(t.toPrecision(6)).toString();
  return text.replace('-', '−');
};

/** Grid lines and tick labels of both axes, the axis titles, and (optionally) nm ticks along the top. */
export function PlotAxes({ x, y, xLabel, yLabel, wavelength }: Props) {
  const [d0, d1] = x.domain() as [number, number];
  const nm = wavelength ? scaleLinear().domain([wavelength.toNm(d0), wavelength.toNm(d1)]) : undefined;
  return (
    <g className="hx-rp-axes" aria-hidden="true">
      {y.ticks(6).map((t) => (
        <g key={`y${t}`}>
          <line className="hx-rp-grid" x1={PLOT_AREA.x0} x2={PLOT_AREA.x1} y1={y(t)} y2={y(t)} />
          <text className="hx-rp-tick" x={PLOT_AREA.x0 - 6} y={y(t)} textAnchor="end" dominantBaseline="middle">
            {tick(t)}
          </text>
        </g>
      ))}
      {x.ticks(8).map((t) => (
        <g key={`x${t}`}>
          <line className="hx-rp-grid" x1={x(t)} x2={x(t)} y1={PLOT_AREA.y0} y2={PLOT_AREA.y1} />
          <text className="hx-rp-tick" x={x(t)} y={PLOT_AREA.y1 + 14} textAnchor="middle">
            {tick(t)}
          </text>
        </g>
      ))}
      {nm && wavelength && (
        <g data-testid="wavelength-axis">
          {nm.ticks(6).map((t) => (
            <text key={`nm${t}`} className="hx-rp-tick" x={x(wavelength.fromNm(t))} y={PLOT_AREA.y0 - 6} textAnchor="middle">
              {Number(t.toPrecision(8)).toString()}
            </text>
          ))}
          <text className="hx-rp-label" x={(PLOT_AREA.x0 + PLOT_AREA.x1) / 2} y={12} textAnchor="middle">
            Wavelength (nm)
          </text>
        </g>
      )}
      <rect className="hx-rp-frame" x={PLOT_AREA.x0} y={PLOT_AREA.y0} width={PLOT_AREA.x1 - PLOT_AREA.x0} height={PLOT_AREA.y1 - PLOT_AREA.y0} />
      <text className="hx-rp-label" x={(PLOT_AREA.x0 + PLOT_AREA.x1) / 2} y={PLOT_HEIGHT - 8} textAnchor="middle">
        {xLabel}
      </text>
      <text className="hx-rp-label" transform={`translate(16 ${(PLOT_AREA.y0 + PLOT_AREA.y1) / 2}) rotate(-90)`} textAnchor="middle">
        {yLabel}
      </text>
    </g>
  );
}
