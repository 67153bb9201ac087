/** Checks a sampled response against a mask: pass/fail per region with margins and the worst frequency. */
import type { MaskRegion, SampledResponse } from './mask-types.js';
import { SynthInputError } from './synth-input-error.js';

export type MaskCheck = {
  kind: MaskRegion['kind'];
  /** What was limited, e.g. "insertion loss", "ripple", "rejection", "delay ripple", "mean delay". */
  quantity: string;
  limit: number;
  measured: number;
  /** Positive when the limit is met, by how much (dB or ps); negative when missed. */
  margin: number;
  pass: boolean;
  /** Frequency of the worst sample in the region, Hz. */
  worstFrequencyHz: number;
  unit: 'dB' | 'ps';
};

export type MaskReport = { pass: boolean; checks: MaskCheck[]; worst: MaskCheck | null };

const indicesIn = (response: SampledResponse, fromHz: number, toHz: number): number[] =>
  response.frequencyHz.flatMap((f, i) => (f >= fromHz && f <= toHz ? [i] : []));

const check = (kind: MaskRegion['kind'], quantity: string, unit: 'dB' | 'ps', limit: number, measured: number, worstFrequencyHz: number, atMost: boolean): MaskCheck => {
  const margin = atMost ? limit - measured : measured - limit;
  return { kind, quantity, unit, limit, measured, margin, pass: margin >= 0, worstFrequencyHz };
};

/**
 * Compares a response with every mask region. Rejection is measured from the pass-band peak (the highest
 * power in any pass region, or in the whole response when the mask has none), common practice for filter masks.
 * @throws SynthInputError when a region contains no sample (the grid is too coarse for the mask).
 */
export function checkMask(response: SampledResponse, regions: readonly MaskRegion[]): MaskReport {
  const passIdx = regions.filter((r) => r.kind === 'pass').flatMap((r) => indicesIn(response, r.range.fromHz, r.range.toHz));
  const peakDb = Math.max(...(passIdx.length > 0 ? passIdx.map((i) => response.powerDb[i] as number) : response.powerDb));
  const checks: MaskCheck[] = [];
  for (const region of regions) {
    const idx = indicesIn(response, region.range.fromHz, region.range.toHz);
    if (idx.length === 0) {
      throw new SynthInputError(`synth: no frequency sample falls in the ${region.kind} region ${region.range.fromHz}..${region.range.toHz} Hz; use a finer grid`);
    }
    const at = (i: number): number => response.frequencyHz[i] as number;
    const power = (i: number): number => response.powerDb[i] as number;
    const delay = (i: number): number => response.groupDelayPs[i] as number;
    const argBy = (f: (i: number) => number, max: boolean): number => idx.reduce((best, i) => ((max ? f(i) > f(best) : f(i) < f(best)) ? i : best), idx[0] as number);
    if (region.kind === 'pass') {
      const low = argBy(power, false);
      const high = argBy(power, true);
      if (region.maxInsertionLossDb !== undefined) checks.push(check('pass', 'insertion loss', 'dB', region.maxInsertionLossDb, -power(low), at(low), true));
      if (region.maxRippleDb !== undefined) checks.push(check('pass', 'ripple', 'dB', region.maxRippleDb, power(high) - power(low), at(low), true));
    } else if (region.kind === 'stop') {
      const high = argBy(power, true);
      checks.push(check('stop', 'rejection', 'dB', region.minRejectionDb, peakDb - power(high), at(high), false));
    } else {
      const low = argBy(delay, false);
      const high = argBy(delay, true);
      if (region.maxDelayRipplePs !== undefined) checks.push(check('delay', 'delay ripple', 'ps', region.maxDelayRipplePs, delay(high) - delay(low), at(high), true));
      if (region.delayPs !== undefined) {
        const mean = idx.reduce((sum, i) => sum + delay(i), 0) / idx.length;
        const furthest = Math.abs(delay(high) - region.delayPs) > Math.abs(delay(low) - region.delayPs) ? high : low;
        checks.push(check('delay', 'mean delay error', 'ps', region.delayTolerancePs ?? 0, Math.abs(mean - region.delayPs), at(furthest), true));
      }
    }
  }
  const worst = checks.reduce<MaskCheck | null>((w, c) => (w === null || c.margin < w.margin ? c : w), null);
  return { pass: checks.every((c) => c.pass), checks, worst };
}
