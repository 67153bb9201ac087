// Measured and simulated power (dB) of one connection overlaid on the measured offsets from the carrier.
import type { Comparison } from '@hexloom/contracts';
import { extent, line, scaleLinear } from 'd3';
import { useMemo } from 'react';
import { PlotAxes } from '../../response/components/PlotAxes.js';
import { PLOT_AREA, PLOT_HEIGHT, PLOT_WIDTH } from '../../response/components/plotLayout.js';
import '../../response/responsePlots.css';

export type ComparisonChartProps = { comparison: Comparison; ariaLabel: string };

/** Two traces in the response plots' palette: measured solid, simulated dashed; a legend in words under the chart. */
export function ComparisonChart({ comparison, ariaLabel }: ComparisonChartProps) {
  const { x, y, measured, simulated } = useMemo(() => {
    const ghz = comparison.offsetHz.map((f) => f / 1e9);
    const [x0 = -1, x1 = 1] = extent(ghz);
    const [y0 = -1, y1 = 0] = extent([...comparison.measuredDb, ...comparison.simulatedDb]);
    const pad = Math.max(1, (y1 - y0) * 0.05);
    const xs = scaleLinear().domain(x0 === x1 ? [x0 - 1, x1 + 1] : [x0, x1]).range([PLOT_AREA.x0, PLOT_AREA.x1]);
    const ys = scaleLinear().domain([y0 - pad, y1 + pad]).nice().range([PLOT_AREA.y1, PLOT_AREA.y0]);
    const path = (values: readonly number[]) => line<number>((_, i) => xs(ghz[i] ?? 0), (v) => ys(v))(values) ?? '';
    return { x: xs, y: ys, measured: path(comparison.measuredDb), simulated: path(comparison.simulatedDb) };
  }, [comparison]);
  return (
    <div className="hx-rp">
      <svg className="hx-rp-chart" viewBox={`0 0 ${PLOT_WIDTH} ${PLOT_HEIGHT}`} role="img" aria-label={ariaLabel} data-testid="comparison-chart">
        <PlotAxes x={x} y={y} xLabel="Offset from the carrier (GHz)" yLabel="Transmitted power (dB)" />
        <path d={simulated} fill="none" stroke="var(--hx-rp-trace-0)" strokeWidth={2} strokeDasharray="6 4" data-testid="trace-simulated" />
        <path d={measured} fill="none" stroke="var(--hx-rp-trace-1)" strokeWidth={2} data-testid="trace-measured" />
      </svg>
      <ul className="hx-measured-legend" aria-label="Legend">
        <li>
          <span className="hx-measured-swatch hx-measured-swatch--measured" aria-hidden="true" /> Measured
        </li>
        <li>
          <span className="hx-measured-swatch hx-measured-swatch--simulated" aria-hidden="true" /> Simulated (dashed)
        </li>
      </ul>
    </div>
  );
}
