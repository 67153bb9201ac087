// Form values (GHz, ps, dB, units as text) -> the spec body in the schema's SI units (Hz, ps, dB, units).
import type { FilterSpecBody } from '@hexloom/contracts';
import { complexList } from './complexList.js';
import { numberList, optionalNumber, requiredNumber } from './numberText.js';
import type { DelayBandValues, RingSizeValues, SpecFormValues } from './specFormValues.js';

const GHZ = 1e9;

/** Keeps only the keys whose value is defined (optional spec fields left blank take the server's default). */
function defined<T extends Record<string, unknown>>(object: T): T {
  return Object.fromEntries(Object.entries(object).filter(([, v]) => v !== undefined)) as T;
}

function ringSize(v: RingSizeValues) {
  if (v.ringMode === 'perimeter') return { perimeterUnits: requiredNumber(v.perimeterUnits) };
  if (v.ringMode === 'fsr') return { fsrHz: requiredNumber(v.fsrGHz, GHZ) };
  return { free: true as const };
}

function delayBand(v: DelayBandValues) {
  const blank = v.bandFromGHz.trim() === '' && v.bandToGHz.trim() === '';
  return defined({
    bandHz: blank ? undefined : { fromHz: requiredNumber(v.bandFromGHz, GHZ), toHz: requiredNumber(v.bandToGHz, GHZ) },
    maxDelayRipplePs: optionalNumber(v.maxDelayRipplePs),
  });
}

/**
 * The spec body the form describes. Blank required numbers become NaN and blank optional ones are left out,
 * so `synthesiseBodySchema` decides what is valid; frequencies typed in GHz are sent in Hz.
 */
export function formValuesToSpecBody(v: SpecFormValues): FilterSpecBody {
  switch (v.kind) {
    case 'delay-line':
      return defined({
        kind: v.kind, from: v.from, to: v.to,
        delay: v.delayMode === 'ps' ? { ps: requiredNumber(v.delay) } : { units: requiredNumber(v.delay) },
        tolerancePs: optionalNumber(v.tolerancePs),
        ...delayBand(v),
      });
    case 'ttd-set':
      return defined({
        kind: v.kind, from: v.from, outputs: v.outputs, stepPs: requiredNumber(v.stepPs), basePs: optionalNumber(v.basePs),
        tolerancePs: optionalNumber(v.tolerancePs), maxImbalanceDb: optionalNumber(v.maxImbalanceDb), ...delayBand(v),
      });
    case 'ring-notch':
      return defined({
        kind: v.kind, from: v.from, to: v.to, centreOffsetHz: requiredNumber(v.centreOffsetGHz, GHZ),
        target:
          v.targetMode === 'depth' ? { notchDepthDb: requiredNumber(v.notchDepthDb), regime: v.regime }
          : v.targetMode === 'fwhm' ? { fwhmHz: requiredNumber(v.fwhmGHz, GHZ) }
          : { critical: true as const },
        ring: ringSize(v),
        depthToleranceDb: v.targetMode === 'fwhm' ? undefined : optionalNumber(v.depthToleranceDb),
        widthTolerancePercent: v.targetMode === 'fwhm' ? optionalNumber(v.widthTolerancePercent) : undefined,
      });
    case 'add-drop':
      return defined({
        kind: v.kind, from: v.from, through: v.through, drop: v.drop, centreOffsetHz: requiredNumber(v.centreOffsetGHz, GHZ),
        bandwidthHz: requiredNumber(v.bandwidthGHz, GHZ), ring: ringSize(v), widthTolerancePercent: optionalNumber(v.widthTolerancePercent),
      });
    case 'coupled-ring-bandpass':
      return defined({
        kind: v.kind, from: v.from, to: v.to, through: v.through, response: v.response, order: requiredNumber(v.order),
        rippleDb: v.response === 'chebyshev' ? requiredNumber(v.rippleDb) : undefined,
        bandwidthHz: requiredNumber(v.bandwidthGHz, GHZ), centreOffsetHz: requiredNumber(v.centreOffsetGHz, GHZ),
        widthTolerancePercent: optionalNumber(v.widthTolerancePercent),
      });
    case 'mzi-lattice': {
      const polynomial = v.band === 'polynomial';
      return defined({
        kind: v.kind, from: v.from, to: v.to, band: v.band, order: requiredNumber(v.order),
        armDifferenceUnits: requiredNumber(v.armDifferenceUnits), centreOffsetHz: requiredNumber(v.centreOffsetGHz, GHZ),
        widthHz: polynomial ? undefined : v.band === 'half-band' ? optionalNumber(v.widthGHz, GHZ) : requiredNumber(v.widthGHz, GHZ), rejectionDb: requiredNumber(v.rejectionDb),
        coefficients: polynomial ? complexList(v.coefficients) : undefined,
        rejectionToleranceDb: polynomial ? undefined : optionalNumber(v.rejectionToleranceDb),
        shapeToleranceDb: polynomial ? optionalNumber(v.shapeToleranceDb) : undefined,
      });
    }
    case 'transversal':
      return defined({
        kind: v.kind, from: v.from, to: v.to, taps: numberList(v.taps), tapDelayUnits: requiredNumber(v.tapDelayUnits),
        shapeToleranceDb: optionalNumber(v.shapeToleranceDb),
      });
    case 'allpass-equaliser':
      return defined({
        kind: v.kind, from: v.from, to: v.to,
        band: { fromHz: requiredNumber(v.bandFromGHz, GHZ), toHz: requiredNumber(v.bandToGHz, GHZ) },
        target: v.targetMode === 'delay' ? { delayPs: requiredNumber(v.delayPs) } : { slopePsPerGHz: requiredNumber(v.slopePsPerGHz) },
        stages: requiredNumber(v.stages), tolerancePs: optionalNumber(v.tolerancePs),
      });
  }
}
