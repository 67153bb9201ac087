/** Targets of an all-pass delay equaliser: the excess delay over the bus follows the flat delay or slope asked. */
import type { FilterSpecBody } from '@hexloom/contracts';
import type { Circuit } from '@hexloom/mesh';
import { maskCheck, type MaskCheck } from './check-mask.js';
import type { TargetResult } from './delay-targets.js';
import type { SampledResponse } from './mask-types.js';
import { indicesWithin, slopeWithin, statsWithin } from './response-measures.js';

type EqualiserSpec = Extract<FilterSpecBody, { kind: 'allpass-equaliser' }>;

/** Delay of the bus alone, units: every bus step plus one pass through each ring coupler. */
export function busUnits(circuit: Circuit): number {
  return circuit.paths.filter((p) => p.role === 'bus').reduce((n, p) => n + p.steps.length, 0) + circuit.couplers.length;
}

/**
 * The excess delay tau(f) - tau_bus over the band against the target: a flat delay (largest deviation within the
 * tolerance) or a slope (least-squares slope within 10 % of the asked one, and the deviation from the best line of that
 * slope within the tolerance). Default tolerance: 10 % of the largest target delay over the band, at least 1 ps.
 */
export function equaliserTargets(spec: EqualiserSpec, circuit: Circuit, response: SampledResponse, unitDelayS: number): TargetResult {
  const { fromHz, toHz } = spec.band;
  const mid = (fromHz + toHz) / 2;
  const busPs = busUnits(circuit) * unitDelayS * 1e12;
  const excess = response.groupDelayPs.map((d) => d - busPs);
  const idx = indicesWithin(response, fromHz, toHz);
  const slopePsPerGHz = slopeWithin(response, excess, fromHz, toHz) * 1e9;
  const mean = statsWithin(response, excess, fromHz, toHz).mean;
  const flat = 'delayPs' in spec.target;
  const target = (f: number): number => ('delayPs' in spec.target ? spec.target.delayPs : mean + (spec.target.slopePsPerGHz * (f - mid)) / 1e9);
  const largest = flat ? (spec.target as { delayPs: number }).delayPs : Math.abs((spec.target as { slopePsPerGHz: number }).slopePsPerGHz * (toHz - fromHz)) / 2e9;
  const tolerance = spec.tolerancePs ?? Math.max(1, 0.1 * largest);
  let error = 0;
  let at = mid;
  for (const i of idx) {
    const f = response.frequencyHz[i] as number;
    const e = Math.abs((excess[i] as number) - target(f));
    if (e > error) {
      error = e;
      at = f;
    }
  }
  const checks: MaskCheck[] = [maskCheck('target', flat ? 'delay error over the band' : 'deviation from the asked slope', 'ps', tolerance, error, at, true)];
  if (!flat) {
    const asked = (spec.target as { slopePsPerGHz: number }).slopePsPerGHz;
    checks.push(maskCheck('target', 'delay slope error', 'ps/GHz', 0.1 * Math.abs(asked), Math.abs(slopePsPerGHz - asked), mid, true));
  }
  const power = statsWithin(response, response.powerDb, fromHz, toHz);
  const delay = statsWithin(response, response.groupDelayPs, fromHz, toHz);
  return {
    checks: [checks],
    figures: [{ meanExcessDelayPs: mean, delaySlopePsPerGHz: slopePsPerGHz, delayErrorPs: error, delayRippleInBandPs: delay.max - delay.min, insertionLossDb: -power.max, amplitudeRippleDb: power.max - power.min }],
  };
}
