// A spec body (SI units) -> the values of its kind's form (GHz, ps, dB, units as text), for prefilling.
import type { FilterSpecBody } from '@hexloom/contracts';
import { complexListText } from './complexList.js';
import { numberToText } from './numberText.js';
import type { DelayBandValues, RingSizeValues, SpecFormValues } from './specFormValues.js';

const GHZ = 1e9;
const t = numberToText;

type Ring = Extract<FilterSpecBody, { kind: 'ring-notch' }>['ring'];
type Band = { fromHz: number; toHz: number } | undefined;

function ringValues(ring: Ring): RingSizeValues {
  if ('perimeterUnits' in ring) return { ringMode: 'perimeter', perimeterUnits: t(ring.perimeterUnits), fsrGHz: '' };
  if ('fsrHz' in ring) return { ringMode: 'fsr', perimeterUnits: '6', fsrGHz: t(ring.fsrHz, GHZ) };
  return { ringMode: 'free', perimeterUnits: '6', fsrGHz: '' };
}

function bandValues(band: Band, maxDelayRipplePs: number | undefined): DelayBandValues {
  return { bandFromGHz: band ? t(band.fromHz, GHZ) : '', bandToGHz: band ? t(band.toHz, GHZ) : '', maxDelayRipplePs: t(maxDelayRipplePs) };
}

/**
 * The form values of `spec`; `port` maps each port the spec names to a pickable ref (see portResolver).
 * Fields of the variants the spec does not use get neutral starting values.
 */
export function specToFormValues(spec: FilterSpecBody, port: (ref: string) => string): SpecFormValues {
  switch (spec.kind) {
    case 'delay-line':
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to),
        delayMode: 'ps' in spec.delay ? 'ps' : 'units', delay: t('ps' in spec.delay ? spec.delay.ps : spec.delay.units),
        tolerancePs: t(spec.tolerancePs), ...bandValues(spec.bandHz, spec.maxDelayRipplePs),
      };
    case 'ttd-set':
      return {
        kind: spec.kind, from: port(spec.from), outputs: spec.outputs.map(port), stepPs: t(spec.stepPs), basePs: t(spec.basePs),
        tolerancePs: t(spec.tolerancePs), maxImbalanceDb: t(spec.maxImbalanceDb), ...bandValues(spec.bandHz, spec.maxDelayRipplePs),
      };
    case 'ring-notch': {
      const target = spec.target;
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to), centreOffsetGHz: t(spec.centreOffsetHz, GHZ),
        targetMode: 'notchDepthDb' in target ? 'depth' : 'fwhmHz' in target ? 'fwhm' : 'critical',
        notchDepthDb: 'notchDepthDb' in target ? t(target.notchDepthDb) : '20',
        regime: 'notchDepthDb' in target ? target.regime : 'under',
        fwhmGHz: 'fwhmHz' in target ? t(target.fwhmHz, GHZ) : '',
        ...ringValues(spec.ring),
        depthToleranceDb: t(spec.depthToleranceDb ?? 1), widthTolerancePercent: t(spec.widthTolerancePercent ?? 10),
      };
    }
    case 'add-drop':
      return {
        kind: spec.kind, from: port(spec.from), through: port(spec.through), drop: port(spec.drop),
        centreOffsetGHz: t(spec.centreOffsetHz, GHZ), bandwidthGHz: t(spec.bandwidthHz, GHZ), ...ringValues(spec.ring),
        widthTolerancePercent: t(spec.widthTolerancePercent),
      };
    case 'coupled-ring-bandpass':
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to), through: port(spec.through), response: spec.response,
        order: t(spec.order), rippleDb: t(spec.rippleDb ?? 0.5), bandwidthGHz: t(spec.bandwidthHz, GHZ),
        centreOffsetGHz: t(spec.centreOffsetHz, GHZ), widthTolerancePercent: t(spec.widthTolerancePercent),
      };
    case 'mzi-lattice':
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to), band: spec.band, order: t(spec.order),
        armDifferenceUnits: t(spec.armDifferenceUnits), centreOffsetGHz: t(spec.centreOffsetHz, GHZ), widthGHz: t(spec.widthHz, GHZ),
        rejectionDb: t(spec.rejectionDb), coefficients: complexListText(spec.coefficients ?? [{ re: 0.5 }, { re: 0.5 }]),
        rejectionToleranceDb: t(spec.rejectionToleranceDb ?? 1), shapeToleranceDb: t(spec.shapeToleranceDb ?? 1),
      };
    case 'transversal':
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to), taps: spec.taps.map((x) => t(x)).join(', '),
        tapDelayUnits: t(spec.tapDelayUnits), shapeToleranceDb: t(spec.shapeToleranceDb),
      };
    case 'allpass-equaliser':
      return {
        kind: spec.kind, from: port(spec.from), to: port(spec.to), bandFromGHz: t(spec.band.fromHz, GHZ), bandToGHz: t(spec.band.toHz, GHZ),
        targetMode: 'delayPs' in spec.target ? 'delay' : 'slope',
        delayPs: 'delayPs' in spec.target ? t(spec.target.delayPs) : '',
        slopePsPerGHz: 'slopePsPerGHz' in spec.target ? t(spec.target.slopePsPerGHz) : '',
        stages: t(spec.stages), tolerancePs: t(spec.tolerancePs),
      };
  }
}
