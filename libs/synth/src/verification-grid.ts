/** The frequency offsets a synthesised circuit is verified on: the mask's ranges, or the band of the design. */
import type { CircuitDesign } from './design-circuit.js';
import type { MaskRegion } from './mask-types.js';

const POINTS = 801;

/** 801 offsets spanning every mask range (padded by 10 %), or a span natural for the design when there is no mask. */
export function verificationOffsets(design: CircuitDesign, regions: readonly MaskRegion[], unitDelayS: number): number[] {
  let lo: number;
  let hi: number;
  if (regions.length > 0) {
    lo = Math.min(...regions.map((r) => r.range.fromHz));
    hi = Math.max(...regions.map((r) => r.range.toHz));
    const pad = 0.1 * (hi - lo);
    lo -= pad;
    hi += pad;
  } else {
    const unitFsr = 1 / unitDelayS;
    switch (design.kind) {
      case 'ring-notch':
      case 'add-drop': {
        const fsr = unitFsr / design.perimeterUnits;
        [lo, hi] = [design.centreOffsetHz - fsr / 2, design.centreOffsetHz + fsr / 2];
        break;
      }
      case 'coupled-ring-bandpass': {
        const fsr = unitFsr / 6;
        [lo, hi] = [design.centreOffsetHz - fsr / 2, design.centreOffsetHz + fsr / 2];
        break;
      }
      case 'mzi-lattice':
        [lo, hi] = [-design.latticeFsrHz / 2, design.latticeFsrHz / 2];
        break;
      default:
        [lo, hi] = [-unitFsr / 16, unitFsr / 16];
    }
  }
  return Array.from({ length: POINTS }, (_, i) => lo + ((hi - lo) * i) / (POINTS - 1));
}
