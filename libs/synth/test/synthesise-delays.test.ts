// Delay lines and delay sets against the outside world: tau = L n_g L_u / c, parity, steps and balance.
import { describe, expect, it } from 'vitest';
import { planDelaySet, synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

const C = 299_792_458;
// T_u = n_g L_u / c (common practice): 4.2 x 650 um / c = 9.106 ps.
const T_U = (DEMO_TECHNOLOGY.groupIndex * DEMO_TECHNOLOGY.unitLengthUm * 1e-6) / C;
const ok = (r: ReturnType<typeof synthesise>): SynthesisSuccess => {
  if (!r.ok) throw new Error(`${r.reason}: ${r.message}`);
  return r;
};

describe('planDelaySet', () => {
  it('keeps every output on the parity of its shortest path (the lattice is bipartite) and steps of whole units', () => {
    const plan = planDelaySet({ stepS: 4 * T_U, baseS: undefined, toleranceS: 1e-12, unitDelayS: T_U, minima: [20, 24, 22, 28] });
    expect(plan.units.map((u) => u % 2)).toEqual([0, 0, 0, 0]);
    expect(plan.units.slice(1).map((u, k) => u - (plan.units[k] as number))).toEqual([4, 4, 4]);
    expect(plan.maxErrorS).toBeLessThan(1e-15);
    expect(plan.units[0]).toBeGreaterThanOrEqual(20);
    expect(plan.units[3]).toBeGreaterThanOrEqual(28);
  });

  it('cannot give outputs of alternating parity an even step: the best base still misses by half a unit', () => {
    const plan = planDelaySet({ stepS: 4 * T_U, baseS: undefined, toleranceS: 0.1 * T_U, unitDelayS: T_U, minima: [20, 21, 22, 23] });
    // n_k = base + 4k needs one parity; with parities 0,1,0,1 the best choice is off by half a unit either way.
    expect(plan.maxErrorS / T_U).toBeCloseTo(0.5, 2);
    expect(plan.withinTolerance).toBe(false);
  });

  it('holds a fixed base', () => {
    const plan = planDelaySet({ stepS: 2 * T_U, baseS: 30 * T_U, toleranceS: 1e-15, unitDelayS: T_U, minima: [10, 10, 10] });
    expect(plan.units).toEqual([30, 32, 34]);
  });
});

describe('a delay set on a chip whose gates do not leak', () => {
  const clean = demoChip({ ...DEMO_TECHNOLOGY, extinctionDb: 300 });
  const result = ok(
    synthesise({
      mesh: clean.mesh,
      configuration: clean.configuration,
      circuitId: 'ttd',
      spec: { schemaVersion: 1, name: 'ttd', spec: { kind: 'ttd-set', from: clean.west[8]!, outputs: [clean.east[4]!, clean.east[8]!, clean.east[12]!], stepPs: 36.4, tolerancePs: 2 }, mask: { regions: [] } },
    }),
  );

  it('gives each output the delay of its path length, L n_g L_u / c, at every frequency', () => {
    result.verification.forEach((v, k) => {
      const branch = result.circuit.paths.find((p) => 'port' in p.to && p.to.port === v.to)!;
      expect(branch).toBeDefined();
      const units = Math.round((v.figures.delayAtCarrierPs as number) / (T_U * 1e12));
      // A delay line of L units is z^-L: group delay L T_u everywhere (common practice).
      for (const d of v.response.groupDelayPs) expect(Math.abs(d - units * T_U * 1e12)).toBeLessThan(1e-6);
      if (k > 0) expect(Math.abs(v.figures.stepErrorPs as number)).toBeLessThan(T_U * 1e12);
    });
    expect(result.verdict.pass).toBe(true);
  });

  it('splits the power so that every output gets the same after the loss of its own path', () => {
    const powers = result.verification.map((v) => -(v.figures.insertionLossDb as number));
    // Equal-power split: each output 1 / sum(1 / L_k) of the input (power bookkeeping, common practice).
    expect(Math.max(...powers) - Math.min(...powers)).toBeLessThan(1e-6);
    for (const v of result.verification) expect(v.figures.imbalanceDb).toBeLessThan(1e-6);
  });
});
