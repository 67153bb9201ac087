import { describe, expect, it } from 'vitest';
import { planMonteCarlo, runMonteCarloChunk, summariseMonteCarlo, synthesise, gateSensitivities, yieldTrial, type SynthesisSuccess, type YieldStudy } from '../src/index.js';
import { demoChip } from './demo-chip.js';

const chip = demoChip();
const result = synthesise({
  mesh: chip.mesh,
  configuration: chip.configuration,
  circuitId: 'notch',
  spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: chip.west[2] as string, to: chip.east[2] as string, centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } },
}) as SynthesisSuccess;
const offsetsHz = Array.from({ length: 201 }, (_, i) => 3e9 - 1e9 + i * 1e7);
const study = (sigma: number, minRejectionDb: number): YieldStudy => ({
  mesh: chip.mesh,
  configuration: result.configuration,
  from: chip.west[2] as string,
  to: chip.east[2] as string,
  offsetsHz,
  mask: [{ kind: 'stop', range: { fromHz: 2.99e9, toHz: 3.01e9 }, minRejectionDb }],
  tolerance: { couplerSigmaRad: sigma, phaseSigmaRad: sigma },
});

describe('Monte Carlo yield of a ring notch', () => {
  it('is 100 % without errors and falls as the errors grow', () => {
    const runs = (sigma: number) => summariseMonteCarlo(planMonteCarlo({ runs: 40, seed: 11, chunkSize: 20 }).flatMap((c) => runMonteCarloChunk(c, yieldTrial(study(sigma, 15)))));
    expect(runs(0).yield).toBe(1);
    const small = runs(0.002).yield;
    const large = runs(0.08).yield;
    expect(small).toBeGreaterThan(0.9);
    expect(large).toBeLessThan(0.5);
  });

  it('repeats exactly for the same seed, chunked differently', () => {
    const a = planMonteCarlo({ runs: 12, seed: 3, chunkSize: 12 }).flatMap((c) => runMonteCarloChunk(c, yieldTrial(study(0.02, 15))));
    const b = planMonteCarlo({ runs: 12, seed: 3, chunkSize: 12 }).flatMap((c) => runMonteCarloChunk(c, yieldTrial(study(0.02, 15))));
    expect(a.map((r) => r.figures.rejectionDb)).toEqual(b.map((r) => r.figures.rejectionDb));
  });

  it('ranks the ring coupler among the gates that matter most', () => {
    const list = gateSensitivities(study(0, 15));
    const coupler = result.circuit.couplers[0]!.gate;
    const rank = list.findIndex((s) => s.gate === coupler);
    expect(rank).toBeGreaterThanOrEqual(0);
    expect(rank).toBeLessThan(6);
  });
});
