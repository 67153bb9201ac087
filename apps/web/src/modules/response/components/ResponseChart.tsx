// The SVG chart of the response: traces, mask, axes, a cursor line, drag-to-zoom (d3-brush) and double-click to reset.
import { brushX, extent, line, scaleLinear, select } from 'd3';
import { type PointerEvent, type RefObject, useEffect, useId, useMemo, useRef } from 'react';
import type { MaskShape } from '../utils/maskShapes.js';
import type { TraceSeries } from '../utils/traceSeries.js';
import { MaskOverlay } from './MaskOverlay.js';
import { CommentBands, type CommentBand } from './CommentBands.js';
import { PlotAxes } from './PlotAxes.js';
import { PLOT_AREA, PLOT_HEIGHT, PLOT_WIDTH } from './plotLayout.js';

type Props = {
  series: readonly TraceSeries[];
  shapes: readonly MaskShape[];
  xLabel: string;
  yLabel: string;
  ariaLabel: string;
  /** The zoomed band (GHz), or null for the whole span. */
  zoom: [number, number] | null;
  onZoom: (band: [number, number] | null) => void;
  /** Cursor position (GHz) or null; reported as the pointer moves. */
  cursorGhz: number | null;
  onCursor: (xGhz: number | null) => void;
  wavelength?: { toNm: (offsetGhz: number) => number; fromNm: (nm: number) => number };
  svgRef: RefObject<SVGSVGElement | null>;
  /** Bands review comments point at (shaded). */
  bands?: readonly CommentBand[] | undefined;
};

type Point = { x: number; y: number | null };

/** Vertical extent of the values inside the shown band and of the mask limits there, padded by 5 %. */
function yDomain(series: readonly TraceSeries[], shapes: readonly MaskShape[], x0: number, x1: number): [number, number] {
  const values = series.flatMap((s) => s.y.flatMap((v, i) => (v !== null && (s.xGhz[i] ?? NaN) >= x0 && (s.xGhz[i] ?? NaN) <= x1 ? [v] : [])));
  const limits = shapes.flatMap((s) => (s.x1Ghz >= x0 && s.x0Ghz <= x1 ? s.limits.map((l) => l.y) : []));
  const [lo = 0, hi = 1] = extent([...values, ...limits]);
  const pad = hi === lo ? Math.max(1, Math.abs(hi) * 0.05) : 0.05 * (hi - lo);
  return [lo - pad, hi + pad];
}

/** One chart; each trace path is `trace-<index>`, coloured by its index. */
export function ResponseChart({ series, shapes, xLabel, yLabel, ariaLabel, zoom, onZoom, cursorGhz, onCursor, wavelength, svgRef, bands = [] }: Props) {
  const brushLayer = useRef<SVGGElement | null>(null);
  const clipId = `hx-rp-clip-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const [full0 = 0, full1 = 1] = extent(series.flatMap((s) => s.xGhz));
  const [x0, x1] = zoom ?? [full0, full1 === full0 ? full0 + 1 : full1];
  const x = useMemo(() => scaleLinear().domain([x0, x1]).range([PLOT_AREA.x0, PLOT_AREA.x1]), [x0, x1]);
  const y = useMemo(() => scaleLinear().domain(yDomain(series, shapes, x0, x1)).range([PLOT_AREA.y1, PLOT_AREA.y0]).nice(), [series, shapes, x0, x1]);
  const paths = series.map((s) => line<Point>().defined((p) => p.y !== null).x((p) => x(p.x)).y((p) => y(p.y ?? 0))(s.xGhz.map((xv, i) => ({ x: xv, y: s.y[i] ?? null }))) ?? '');

  const zoomTo = useRef(onZoom);
  zoomTo.current = onZoom;
  useEffect(() => {
    const layer = brushLayer.current;
    if (!layer) return;
    const brush = brushX<unknown>()
      .extent([[PLOT_AREA.x0, PLOT_AREA.y0], [PLOT_AREA.x1, PLOT_AREA.y1]])
      .on('end', (event: { selection: [number, number] | null; sourceEvent?: unknown }) => {
        if (!event.selection || !event.sourceEvent) return;
        const [p0, p1] = event.selection;
        if (p1 - p0 > 2) zoomTo.current([x.invert(p0), x.invert(p1)]);
        select(layer).call(brush.move, null);
      });
    select(layer).call(brush);
    return () => {
      select(layer).on('.brush', null);
    };
  }, [x]);

  const pointerToGhz = (event: PointerEvent<SVGSVGElement>): number | null => {
    const svg = svgRef.current;
    if (!svg) return null;
    const rect = svg.getBoundingClientRect();
    const scale = rect.width > 0 ? PLOT_WIDTH / rect.width : 1;
    const px = (event.clientX - rect.left) * scale;
    return px < PLOT_AREA.x0 || px > PLOT_AREA.x1 ? null : x.invert(px);
  };

  return (
    <svg
      ref={svgRef}
      className="hx-rp-chart"
      viewBox={`0 0 ${PLOT_WIDTH} ${PLOT_HEIGHT}`}
      role="img"
      aria-label={ariaLabel}
      data-testid="response-chart"
      onPointerMove={(e) => onCursor(pointerToGhz(e))}
      onPointerLeave={() => onCursor(null)}
      onDoubleClick={() => onZoom(null)}
    >
      <defs>
        <clipPath id={clipId}>
          <rect x={PLOT_AREA.x0} y={PLOT_AREA.y0} width={PLOT_AREA.x1 - PLOT_AREA.x0} height={PLOT_AREA.y1 - PLOT_AREA.y0} />
        </clipPath>
      </defs>
      <PlotAxes x={x} y={y} xLabel={xLabel} yLabel={yLabel} {...(wavelength ? { wavelength } : {})} />
      <g clipPath={`url(#${clipId})`}>
        <MaskOverlay shapes={shapes} x={x} y={y} />
        {bands.length > 0 && <CommentBands bands={bands} x={x} />}
        {paths.map((d, i) => (
          <path key={i} className={`hx-rp-trace hx-rp-trace-${i % 6}`} d={d} data-testid={`trace-${i}`} />
        ))}
      </g>
      {cursorGhz !== null && <line className="hx-rp-cursor" data-export="skip" data-testid="cursor-line" x1={x(cursorGhz)} x2={x(cursorGhz)} y1={PLOT_AREA.y0} y2={PLOT_AREA.y1} />}
      <g ref={brushLayer} className="hx-rp-brush" data-export="skip" />
    </svg>
  );
}
