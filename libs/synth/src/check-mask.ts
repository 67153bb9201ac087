/** Checks a sampled response against a mask: pass/fail per region with margins and the worst frequency. */
import type { MaskRegion, SampledResponse } from './mask-types.js';
import { SynthInputError } from './synth-input-error.js';

/** Units a check is stated in. */
export type CheckUnit = 'dB' | 'ps' | 'Hz' | '%' | 'ps/GHz';

export type MaskCheck = {
  /** A mask region's kind, or `target` for a check derived from the specification's own targets. */
  kind: MaskRegion['kind'] | 'target';
  /** What was limited, e.g. "insertion loss", "ripple", "rejection", "delay ripple", "mean delay", "notch depth". */
  quantity: string;
  limit: number;
  measured: number;
  /** `at-most`: met when measured <= limit; `at-least`: met when measured >= limit. */
  direction: 'at-most' | 'at-least';
  /** Positive when the limit is met, by how much (dB or ps); negative when missed. */
  margin: number;
  pass: boolean;
  /** Frequency of the worst sample in the region, Hz. */
  worstFrequencyHz: number;
  unit: CheckUnit;
};

export type MaskReport = { pass: boolean; checks: MaskCheck[]; worst: MaskCheck | null };

const indicesIn = (response: SampledResponse, fromHz: number, toHz: number): number[] =>
  response.frequencyHz.flatMap((f, i) => (f >= fromHz && f <= toHz ? [i] : []));

/** One check: `atMost` limits from above (measured <= limit), otherwise from below (measured >= limit). */
export const maskCheck = (kind: MaskCheck['kind'], quantity: string, unit: CheckUnit, limit: number, measured: number, worstFrequencyHz: number, atMost: boolean): MaskCheck => {
  const margin = atMost ? limit - measured : measured - limit;
  return { kind, quantity, unit, limit, measured, direction: atMost ? 'at-most' : 'at-least', margin, pass: margin >= 0, worstFrequencyHz };
};

/**
 * Compares a response with every mask region. Rejection is measured from the pass-band peak (the highest
 * power in any pass region, or in the whole response when the mask has none), common practice for filter masks.
 * @throws SynthInputError when a region contains no sample (the grid is too coarse for the mask).
 */
export function checkMask(response: SampledResponse, regions: readonly MaskRegion[]): MaskReport {
  const passIdx = regions.filter((r) => r.kind === 'pass').flatMap((r) => indicesIn(response, r.range.fromHz, r.range.toHz));
  const peakDb = (passIdx.length > 0 ? passIdx.map((i) => response.powerDb[i] as number) : [...response.powerDb]).reduce((m, p) => Math.max(m, p), -Infinity);
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
      if (region.maxInsertionLossDb !== undefined) checks.push(maskCheck('pass', 'insertion loss', 'dB', region.maxInsertionLossDb, -power(low), at(low), true));
      if (region.maxRippleDb !== undefined) checks.push(maskCheck('pass', 'ripple', 'dB', region.maxRippleDb, power(high) - power(low), at(low), true));
    } else if (region.kind === 'stop') {
      const high = argBy(power, true);
      checks.push(maskCheck('stop', 'rejection', 'dB', region.minRejectionDb, peakDb - power(high), at(high), false));
    } else {
      const low = argBy(delay, false);
      const high = argBy(delay, true);
      if (region.maxDelayRipplePs !== undefined) checks.push(maskCheck('delay', 'delay ripple', 'ps', region.maxDelayRipplePs, delay(high) - delay(low), at(high), true));
      if (region.delayPs !== undefined) {
        const mean = idx.reduce((sum, i) => sum + delay(i), 0) / idx.length;
        const furthest = Math.abs(delay(high) - region.delayPs) > Math.abs(delay(low) - region.delayPs) ? high : low;
        checks.push(maskCheck('delay', 'mean delay error', 'ps', region.delayTolerancePs ?? 0, Math.abs(mean - region.delayPs), at(furthest), true));
      }
    }
  }
  return maskReport(checks);
}

/**
 * How close a check is to its limit: measured / limit for an upper limit, limit / measured for a lower one, so 1 is
 * on the limit and below 1 is met (0 for a limit met with nothing to measure, Infinity for one that cannot be).
 */
export function checkRatio(c: MaskCheck): number {
  const [num, den] = c.direction === 'at-most' ? [c.measured, c.limit] : [c.limit, c.measured];
  if (den > 0) return Math.max(0, num) / den;
  return num <= 0 ? 0 : Infinity;
}

/** The report of a list of checks: passes when every check does; `worst` has the smallest margin. */
export function maskReport(checks: MaskCheck[]): MaskReport {
  const worst = checks.reduce<MaskCheck | null>((w, c) => (w === null || c.margin < w.margin ? c : w), null);
  return { pass: checks.every((c) => c.pass), checks, worst };
}
