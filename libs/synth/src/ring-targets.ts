/** Targets of ring circuits: notch depth, width and frequency; drop-band width and centre; band-pass ripple. */
import type { FilterSpecBody } from '@hexloom/contracts';
import { maskCheck, type MaskCheck } from './check-mask.js';
import type { TargetResult } from './delay-targets.js';
import type { CircuitDesign } from './design-circuit.js';
import type { SampledResponse } from './mask-types.js';
import { bandNear, notchNear, statsWithin, valueAt } from './response-measures.js';

/** Depth a "critical coupling" notch must at least reach, dB (a Hexloom reading of "critical" on a real chip). */
export const CRITICAL_NOTCH_MIN_DEPTH_DB = 20;

const percent = (measured: number, wanted: number): number => (100 * Math.abs(measured - wanted)) / wanted;

/** Notch figures of a response around `centreHz` (search a quarter of the ring FSR either side). */
export function notchFigures(r: SampledResponse, centreHz: number, fsrHz: number): Record<string, number> {
  const n = notchNear(r, centreHz, fsrHz / 4);
  return { notchDepthDb: n.depthDb, notchFrequencyHz: n.frequencyHz, notchWidthHz: n.widthHz, insertionLossDb: -n.offResonanceDb };
}

/** Band-pass figures of a response around `centreHz`: the band at `levelDb` below the peak, ripple over `passHz`, rejection two band widths or more from the centre. */
export function bandPassFigures(r: SampledResponse, centreHz: number, searchHz: number, passHz: [number, number], levelDb = 3, bandWidth = 2 * searchHz): Record<string, number> {
  const b = bandNear(r, centreHz, searchHz, levelDb);
  const pass = statsWithin(r, r.powerDb, passHz[0], passHz[1]);
  let far = -Infinity;
  r.frequencyHz.forEach((f, i) => {
    if (Math.abs(f - centreHz) >= 2 * bandWidth) far = Math.max(far, r.powerDb[i] as number);
  });
  // The delay peaks of a sharp band sit at its edges: read them there too, not only at the samples inside.
  const delay = statsWithin(r, r.groupDelayPs, b.lowHz, b.highHz);
  const edges = [valueAt(r, r.groupDelayPs, b.lowHz), valueAt(r, r.groupDelayPs, b.highHz)];
  delay.max = Math.max(delay.max, ...edges);
  delay.min = Math.min(delay.min, ...edges);
  return {
    insertionLossDb: -b.peakDb,
    centreFrequencyHz: (b.lowHz + b.highHz) / 2,
    bandwidthHz: b.widthHz,
    bandLowHz: b.lowHz,
    bandHighHz: b.highHz,
    passbandRippleDb: pass.max - pass.min,
    ...(Number.isFinite(far) ? { rejectionDb: b.peakDb - far } : {}),
    delayRippleInBandPs: delay.max - delay.min,
    meanDelayInBandPs: delay.mean,
  };
}

type RingSpec = Extract<FilterSpecBody, { kind: 'ring-notch' | 'add-drop' | 'coupled-ring-bandpass' }>;

/** Checks and figures of the outputs of a ring notch, add-drop ring or coupled-ring band-pass (main output first). */
export function ringTargets(spec: RingSpec, design: CircuitDesign, responses: readonly SampledResponse[], unitDelayS: number): TargetResult {
  const main = responses[0] as SampledResponse;
  if (spec.kind === 'ring-notch' && design.kind === 'ring-notch') {
    const fsr = 1 / (design.perimeterUnits * unitDelayS);
    const f = notchFigures(main, spec.centreOffsetHz, fsr);
    const checks: MaskCheck[] = [];
    const depth = f.notchDepthDb as number;
    if ('notchDepthDb' in spec.target) checks.push(maskCheck('target', 'notch depth', 'dB', spec.target.notchDepthDb - (spec.depthToleranceDb ?? 1), depth, f.notchFrequencyHz as number, false));
    else if ('critical' in spec.target) checks.push(maskCheck('target', 'notch depth', 'dB', CRITICAL_NOTCH_MIN_DEPTH_DB, depth, f.notchFrequencyHz as number, false));
    else checks.push(maskCheck('target', 'notch width error', '%', spec.widthTolerancePercent ?? 10, percent(f.notchWidthHz as number, spec.target.fwhmHz), f.notchFrequencyHz as number, true));
    checks.push(maskCheck('target', 'notch frequency error', 'Hz', design.ring.fwhmHz / 4, Math.abs((f.notchFrequencyHz as number) - spec.centreOffsetHz), f.notchFrequencyHz as number, true));
    return { checks: [checks], figures: [f] };
  }
  if (spec.kind === 'add-drop' && design.kind === 'add-drop') {
    const fsr = 1 / (design.perimeterUnits * unitDelayS);
    const half = spec.bandwidthHz / 2;
    const f = bandPassFigures(main, spec.centreOffsetHz, fsr / 4, [spec.centreOffsetHz - half / 2, spec.centreOffsetHz + half / 2], 3, spec.bandwidthHz);
    const checks = [
      maskCheck('target', 'drop 3 dB width error', '%', spec.widthTolerancePercent ?? 15, percent(f.bandwidthHz as number, spec.bandwidthHz), f.centreFrequencyHz as number, true),
      maskCheck('target', 'drop centre error', 'Hz', spec.bandwidthHz / 4, Math.abs((f.centreFrequencyHz as number) - spec.centreOffsetHz), f.centreFrequencyHz as number, true),
    ];
    const through = responses[1] ? [notchFigures(responses[1], spec.centreOffsetHz, fsr)] : [];
    return { checks: [checks, ...through.map(() => [])], figures: [f, ...through] };
  }
  if (spec.kind === 'coupled-ring-bandpass' && design.kind === 'coupled-ring-bandpass') {
    const fsr = 1 / (design.perimeterUnits * unitDelayS);
    const level = spec.response === 'chebyshev' ? (spec.rippleDb as number) : 3;
    const c = spec.centreOffsetHz;
    const f = bandPassFigures(main, c, spec.bandwidthHz, [c - 0.4 * spec.bandwidthHz, c + 0.4 * spec.bandwidthHz], level, spec.bandwidthHz);
    const where = f.centreFrequencyHz as number;
    const checks = [
      maskCheck('target', `pass-band width error (at ${level} dB)`, '%', spec.widthTolerancePercent ?? 15, percent(f.bandwidthHz as number, spec.bandwidthHz), where, true),
      maskCheck('target', 'pass-band centre error', 'Hz', spec.bandwidthHz / 4, Math.abs(where - c), where, true),
    ];
    // Chebyshev ripple over the inner 80 % of the band, with 0.5 dB for dissipation rounding the edges (Hexloom default).
    if (spec.response === 'chebyshev') checks.push(maskCheck('target', 'pass-band ripple', 'dB', (spec.rippleDb as number) + 0.5, f.passbandRippleDb as number, c, true));
    const through = responses[1] ? [{ ...notchFigures(responses[1], c, fsr), throughAtCentreDb: valueAt(responses[1], responses[1].powerDb, c) }] : [];
    return { checks: [checks, ...through.map(() => [])], figures: [f, ...through] };
  }
  throw new Error(`synth: spec ${spec.kind} does not match design ${design.kind}`);
}
