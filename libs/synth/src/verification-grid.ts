/** The frequency offsets a synthesised circuit is verified on: the design's natural span plus every mask range. */
import type { CircuitDesign } from './design-circuit.js';
import type { MaskRegion } from './mask-types.js';

const SPAN_POINTS = 801;
const REGION_POINTS = 201;

const linspace = (lo: number, hi: number, n: number): number[] => Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));

/** The span where the design's response lives: one ring FSR around the centre, a lattice FSR, or a sixteenth of the unit FSR. */
function naturalSpan(design: CircuitDesign, unitDelayS: number): [number, number] {
  const unitFsr = 1 / unitDelayS;
  switch (design.kind) {
    case 'ring-notch':
    case 'add-drop': {
      const fsr = unitFsr / design.perimeterUnits;
      return [design.centreOffsetHz - fsr / 2, design.centreOffsetHz + fsr / 2];
    }
    case 'coupled-ring-bandpass':
      return [design.centreOffsetHz - unitFsr / 12, design.centreOffsetHz + unitFsr / 12];
    case 'mzi-lattice':
      return [-design.latticeFsrHz / 2, design.latticeFsrHz / 2];
    case 'delay-line':
    case 'ttd-set': {
      const [lo, hi] = design.bandHz;
      const pad = 0.25 * (hi - lo);
      return [Math.min(lo - pad, -pad), Math.max(hi + pad, pad)];
    }
    default:
      return [-unitFsr / 16, unitFsr / 16];
  }
}

/** Frequencies a design's checks read exactly: the carrier, the centre, the band edges. */
function keyOffsets(design: CircuitDesign): number[] {
  switch (design.kind) {
    case 'delay-line':
    case 'ttd-set':
      return [0, ...design.bandHz];
    case 'ring-notch':
    case 'add-drop':
    case 'coupled-ring-bandpass':
      return [0, design.centreOffsetHz];
    default:
      return [0];
  }
}

/**
 * 801 offsets over the natural span (so rejection is measured against the real pass band; for delays, the band and
 * a quarter more on each side), 201 over each mask range padded by 10 % (so narrow regions are sampled finely), and
 * the carrier, centre and band edges the checks read, merged in increasing order. The verification then bisects
 * where the response moves fast (see `transmissionsFrom`).
 */
export function verificationOffsets(design: CircuitDesign, regions: readonly MaskRegion[], unitDelayS: number, density: { spanPoints: number; regionPoints: number } = { spanPoints: SPAN_POINTS, regionPoints: REGION_POINTS }): number[] {
  const [lo, hi] = naturalSpan(design, unitDelayS);
  const points = [...linspace(lo, hi, density.spanPoints), ...keyOffsets(design)];
  for (const r of regions) {
    const pad = 0.1 * (r.range.toHz - r.range.fromHz);
    points.push(...linspace(r.range.fromHz - pad, r.range.toHz + pad, density.regionPoints));
  }
  return [...new Set(points)].sort((a, b) => a - b);
}

/** The coarser grid of Monte Carlo runs: 161 points over the natural span and 41 over each mask range. */
export const MONTE_CARLO_DENSITY = { spanPoints: 161, regionPoints: 41 };
