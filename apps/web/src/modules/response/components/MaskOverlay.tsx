// The mask on the chart: each region's band, its limit lines, and the sub-bands where the curve fails (fail colour).
import type { ScaleLinear } from 'd3';
import type { MaskShape } from '../utils/maskShapes.js';
import { PLOT_AREA } from './plotLayout.js';

type Props = { shapes: readonly MaskShape[]; x: ScaleLinear<number, number>; y: ScaleLinear<number, number> };

const KIND_WORDS: Record<MaskShape['kind'], string> = { pass: 'pass band', stop: 'stop band', delay: 'delay band' };

/** Bands in a pass or fail shade, dashed limit lines, and a title per region for hover help. */
export function MaskOverlay({ shapes, x, y }: Props) {
  const clampX = (v: number): number => Math.min(PLOT_AREA.x1, Math.max(PLOT_AREA.x0, x(v)));
  return (
    <g className="hx-rp-mask" data-testid="mask-overlay">
      {shapes.map((s, i) => {
        const x0 = clampX(s.x0Ghz), x1 = clampX(s.x1Ghz);
        const failing = s.fails.length > 0;
        return (
          <g key={i} data-testid={`mask-region-${i}`} data-verdict={failing ? 'fail' : 'pass'}>
            <title>{`Mask ${KIND_WORDS[s.kind]}, ${failing ? 'the curve breaks its limit here' : 'the curve meets its limit'}`}</title>
            <rect className={`hx-rp-band ${failing ? 'hx-rp-band-fail' : 'hx-rp-band-pass'}`} x={x0} width={Math.max(0, x1 - x0)} y={PLOT_AREA.y0} height={PLOT_AREA.y1 - PLOT_AREA.y0} />
            {s.fails.map((f, k) => {
              const f0 = clampX(f.x0Ghz), f1 = clampX(f.x1Ghz);
              return <rect key={k} className="hx-rp-fail" data-testid="mask-fail" x={f0} width={Math.max(1, f1 - f0)} y={PLOT_AREA.y0} height={PLOT_AREA.y1 - PLOT_AREA.y0} />;
            })}
            {s.limits.map((l, k) => (
              <line key={`l${k}`} className="hx-rp-limit" x1={x0} x2={x1} y1={y(l.y)} y2={y(l.y)} />
            ))}
          </g>
        );
      })}
    </g>
  );
}
