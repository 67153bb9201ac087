/** Targets of delay lines and true-time-delay sets: delay at the carrier, ripple over the band, amplitude balance. */
import { maskCheck, type MaskCheck } from './check-mask.js';
import type { SampledResponse } from './mask-types.js';
import { statsWithin, valueAt } from './response-measures.js';

/** Checks and figures of each output, in output order. */
export type TargetResult = { checks: MaskCheck[][]; figures: Record<string, number>[] };

type DelayLimits = { toleranceS: number; bandHz: [number, number]; maxRippleS: number };

/** Delay at the carrier, ripple and mean delay over the band, insertion loss at the carrier. */
function delayFigures(r: SampledResponse, bandHz: [number, number]): { delayAtCarrierPs: number; delayRippleInBandPs: number; meanDelayInBandPs: number; insertionLossDb: number; worstRippleHz: number } {
  const d = statsWithin(r, r.groupDelayPs, bandHz[0], bandHz[1]);
  return {
    delayAtCarrierPs: valueAt(r, r.groupDelayPs, 0),
    delayRippleInBandPs: d.max - d.min,
    meanDelayInBandPs: d.mean,
    insertionLossDb: -valueAt(r, r.powerDb, 0),
    worstRippleHz: d.maxAtHz,
  };
}

const delayChecks = (f: ReturnType<typeof delayFigures>, targetPs: number, limits: DelayLimits): MaskCheck[] => [
  maskCheck('target', 'delay error at the carrier', 'ps', limits.toleranceS * 1e12, Math.abs(f.delayAtCarrierPs - targetPs), 0, true),
  maskCheck('target', 'delay ripple over the band', 'ps', limits.maxRippleS * 1e12, f.delayRippleInBandPs, f.worstRippleHz, true),
];

/** A delay line: its delay at the carrier within the tolerance of the request, its ripple over the band within the limit. */
export function delayLineTargets(response: SampledResponse, design: DelayLimits & { delayS: number }): TargetResult {
  const f = delayFigures(response, design.bandHz);
  const targetPs = design.delayS * 1e12;
  const { worstRippleHz: _w, ...figures } = f;
  return { checks: [delayChecks(f, targetPs, design)], figures: [{ ...figures, targetDelayPs: targetPs, delayErrorPs: f.delayAtCarrierPs - targetPs }] };
}

/**
 * A delay set: output k should see base + k step at the carrier. With no base in the spec the base is free (only the
 * steps steer a beam), so it is fitted to the realised delays (the midrange of delay_k - k step, which minimises the
 * largest error); each output is checked for its error, its ripple over the band, and its power against the strongest output.
 */
export function delaySetTargets(responses: readonly SampledResponse[], design: DelayLimits & { stepS: number; baseS: number | undefined; maxImbalanceDb: number }): TargetResult & { basePs: number } {
  const stepPs = design.stepS * 1e12;
  const f = responses.map((r) => delayFigures(r, design.bandHz));
  const offsets = f.map((x, k) => x.delayAtCarrierPs - k * stepPs);
  const basePs = design.baseS !== undefined ? design.baseS * 1e12 : (Math.min(...offsets) + Math.max(...offsets)) / 2;
  const strongest = Math.min(...f.map((x) => x.insertionLossDb));
  const checks: MaskCheck[][] = [];
  const figures: Record<string, number>[] = [];
  f.forEach((x, k) => {
    const targetPs = basePs + k * stepPs;
    const imbalanceDb = x.insertionLossDb - strongest;
    checks.push([...delayChecks(x, targetPs, design), maskCheck('target', 'amplitude imbalance', 'dB', design.maxImbalanceDb, imbalanceDb, 0, true)]);
    const { worstRippleHz: _w, ...rest } = x;
    figures.push({
      ...rest,
      targetDelayPs: targetPs,
      delayErrorPs: x.delayAtCarrierPs - targetPs,
      ...(k > 0 ? { stepErrorPs: x.delayAtCarrierPs - (f[k - 1] as typeof x).delayAtCarrierPs - stepPs } : {}),
      imbalanceDb,
    });
  });
  return { checks, figures, basePs };
}
