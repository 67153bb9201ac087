// The simulated response as two stacked plots: transmission (dB) and group delay (ps) against the offset from the carrier.
import type { SpectrumFile } from '@hexloom/contracts';
import { extent, line, scaleLinear } from 'd3';

const WIDTH = 760;
const PANEL = 170;
const GAP = 36;
const MARGIN = { left: 58, right: 16, top: 12, bottom: 34 };

type Point = { x: number; y: number };

/** Points with a finite y (the dB of an exact zero is null in the file). */
function series(xs: readonly number[], ys: readonly (number | null)[]): Point[] {
  return xs.flatMap((x, i) => {
    const y = ys[i];
    return y === null || y === undefined || !Number.isFinite(y) ? [] : [{ x, y }];
  });
}

function Panel({ points, top, label, unit, testId }: { points: Point[]; top: number; label: string; unit: string; testId: string }) {
  const [x0 = 0, x1 = 1] = extent(points, (p) => p.x);
  const [y0 = 0, y1 = 1] = extent(points, (p) => p.y);
  const pad = y1 === y0 ? 1 : 0.05 * (y1 - y0);
  const x = scaleLinear().domain([x0, x1]).range([MARGIN.left, WIDTH - MARGIN.right]);
  const y = scaleLinear().domain([y0 - pad, y1 + pad]).range([top + PANEL, top]).nice();
  const path = line<Point>().x((p) => x(p.x)).y((p) => y(p.y))(points) ?? '';
  return (
    <g data-testid={testId}>
      {y.ticks(5).map((t) => (
        <g key={t}>
          <line className="hx-plot-grid" x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(t)} y2={y(t)} />
          <text className="hx-plot-tick" x={MARGIN.left - 6} y={y(t)} textAnchor="end" dominantBaseline="middle">
            {t}
          </text>
        </g>
      ))}
      {x.ticks(8).map((t) => (
        <text key={t} className="hx-plot-tick" x={x(t)} y={top + PANEL + 14} textAnchor="middle">
          {t}
        </text>
      ))}
      <text className="hx-plot-label" transform={`translate(14 ${top + PANEL / 2}) rotate(-90)`} textAnchor="middle">
        {label} ({unit})
      </text>
      <path className="hx-plot-line" d={path} />
    </g>
  );
}

/** Transmission in dB and group delay in ps against the offset from the carrier in GHz. */
export function ResponsePlot({ spectrum }: { spectrum: SpectrumFile }) {
  const ghz = spectrum.points.offsetHz.map((f) => f / 1e9);
  const height = MARGIN.top + 2 * PANEL + GAP + MARGIN.bottom + 10;
  return (
    <svg className="hx-plot" viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-label={`Response from ${spectrum.from} to ${spectrum.to}`} data-testid="response-plot">
      <Panel points={series(ghz, spectrum.points.amplitudeDb)} top={MARGIN.top} label="transmission" unit="dB" testId="plot-amplitude" />
      <Panel points={series(ghz, spectrum.points.groupDelayPs)} top={MARGIN.top + PANEL + GAP} label="group delay" unit="ps" testId="plot-delay" />
      <text className="hx-plot-label" x={(MARGIN.left + WIDTH - MARGIN.right) / 2} y={height - 4} textAnchor="middle">
        offset from the carrier (GHz)
      </text>
    </svg>
  );
}
