// Histogram of the worst mask margin over the runs (d3 scales, SVG), with the 0 dB pass/fail boundary marked.
import { max, scaleLinear } from 'd3';
import { useMemo } from 'react';
import { formatNumber } from '../../figures/utils/formatFigure.js';
import { marginHistogram } from '../utils/marginHistogram.js';

export type MarginHistogramProps = {
  /** Worst mask margin of each run, dB (at least 0 = the run meets the mask). */
  marginsDb: readonly number[];
  /** About this many bars. */
  binCount?: number;
};

const W = 640;
const H = 240;
const M = { top: 16, right: 16, bottom: 44, left: 48 };

const db = (v: number): string => `${formatNumber(Number(v.toFixed(6)), 3)} dB`;

/** One bar per bin, labelled in dB; bars right of 0 dB passed, left of it failed. */
export function MarginHistogram({ marginsDb, binCount = 20 }: MarginHistogramProps) {
  const bins = useMemo(() => marginHistogram(marginsDb, binCount), [marginsDb, binCount]);
  if (bins.length === 0) return <p className="hx-muted">No runs to show.</p>;
  const x = scaleLinear().domain([Math.min(bins[0]!.x0Db, 0), Math.max(bins[bins.length - 1]!.x1Db, 0)]).range([M.left, W - M.right]);
  const y = scaleLinear().domain([0, max(bins, (b) => b.count) ?? 1]).nice().range([H - M.bottom, M.top]);
  const xTicks = x.ticks(6);
  const yTicks = y.ticks(4);
  return (
    <figure className="hx-yield-histogram" style={{ margin: 0 }}>
      <svg viewBox={`0 0 ${W} ${H}`} width="100%" role="img" aria-label={`Histogram of the worst mask margin over ${marginsDb.length} runs, in ${bins.length} bins`} data-testid="margin-histogram">
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke="var(--hx-border)" />
            <text x={M.left - 6} y={y(t)} dy="0.32em" textAnchor="end" fontSize={11} fill="var(--hx-muted)">
              {t}
            </text>
          </g>
        ))}
        {bins.map((b) => (
          <rect
            key={`${b.x0Db}`}
            data-testid="margin-bar"
            data-count={b.count}
            x={x(b.x0Db) + 0.5}
            width={Math.max(0, x(b.x1Db) - x(b.x0Db) - 1)}
            y={y(b.count)}
            height={y(0) - y(b.count)}
            fill={b.x0Db >= 0 ? 'var(--hx-loom-500)' : 'var(--hx-amber-500)'}
          >
            <title>{`${db(b.x0Db)} to ${db(b.x1Db)}: ${b.count} ${b.count === 1 ? 'run' : 'runs'}`}</title>
          </rect>
        ))}
        {xTicks.map((t) => (
          <text key={`x${t}`} x={x(t)} y={H - M.bottom + 16} textAnchor="middle" fontSize={11} fill="var(--hx-muted)">
            {db(t)}
          </text>
        ))}
        <line x1={x(0)} x2={x(0)} y1={M.top - 6} y2={H - M.bottom} stroke="var(--hx-text)" strokeWidth={2} strokeDasharray="5 3" data-testid="pass-fail-line" />
        <text x={x(0) + 4} y={M.top + 4} fontSize={11} fill="var(--hx-text)">
          pass/fail 0 dB
        </text>
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize={12} fill="var(--hx-text)">
          Worst mask margin (dB)
        </text>
        <text transform={`translate(12 ${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle" fontSize={12} fill="var(--hx-text)">
          Runs
        </text>
      </svg>
      <figcaption className="hx-muted">Amber bars failed the mask (margin below 0 dB); teal bars met it.</figcaption>
    </figure>
  );
}
