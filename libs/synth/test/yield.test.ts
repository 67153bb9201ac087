// Monte Carlo yield of a synthesised ring notch: yield against error size, results that ignore the chunking, sensitivities.
import { describe, expect, it } from 'vitest';
import { buildMesh, DEMO_TECHNOLOGY, emptyConfiguration, makeMeshDefinition, vertexPosition } from '@hexloom/mesh';
import { planMonteCarlo, runMonteCarloChunk, summariseMonteCarlo, synthesise, gateSensitivities, yieldTrial, type MonteCarloRun, type SynthesisSuccess, type YieldStudy } from '../src/index.js';

// A small invented chip (4 x 6 cells, I/O on the west and east sides): every whole-chip simulation stays cheap.
const definition = makeMeshDefinition({ name: 'small yield chip', shape: { kind: 'rectangle', rows: 4, columns: 6 }, technology: DEMO_TECHNOLOGY });
const mesh = buildMesh(definition);
const xs = mesh.ports.map((p) => vertexPosition(p.site).x);
const midX = (Math.min(...xs) + Math.max(...xs)) / 2;
const west = mesh.ports
  .filter((_p, i) => (xs[i] as number) < midX)
  .map((p) => p.id)
  .sort((a, b) => vertexPosition(a.split('/')[0] as string).y - vertexPosition(b.split('/')[0] as string).y || (a < b ? -1 : 1));
// A notch between two neighbouring west ports: a short bus past one ring, so few gates are used.
const [from, to] = [west[2] as string, west[3] as string];
const result = synthesise({
  mesh,
  configuration: emptyConfiguration(definition),
  circuitId: 'notch',
  spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from, to, centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } },
}) as SynthesisSuccess;
// 2 to 4 GHz in 50 MHz steps: the notch, the peak its rejection is measured from, and one sample (3 GHz) in the stop band.
const offsetsHz = Array.from({ length: 41 }, (_, i) => 2e9 + i * 5e7);
const study = (sigmaRad: number): YieldStudy => ({
  mesh,
  configuration: result.configuration,
  from,
  to,
  offsetsHz,
  mask: [{ kind: 'stop', range: { fromHz: 2.99e9, toHz: 3.01e9 }, minRejectionDb: 15 }],
  tolerance: { couplerSigmaRad: sigmaRad, phaseSigmaRad: sigmaRad },
});
const monteCarlo = ({ sigmaRad, runs, seed, chunkSize }: { sigmaRad: number; runs: number; seed: number; chunkSize: number }): MonteCarloRun[] => {
  const trial = yieldTrial(study(sigmaRad));
  return planMonteCarlo({ runs, seed, chunkSize }).flatMap((c) => runMonteCarloChunk(c, trial));
};

describe('Monte Carlo yield of a ring notch', () => {
  it('is 100 % without errors and falls as the errors grow', () => {
    expect(result.ok).toBe(true);
    const yieldOf = (sigmaRad: number, runs: number): number => summariseMonteCarlo(monteCarlo({ sigmaRad, runs, seed: 11, chunkSize: 7 })).yield;
    expect(yieldOf(0, 3)).toBe(1);
    expect(yieldOf(0.002, 20)).toBeGreaterThan(0.9);
    expect(yieldOf(0.08, 20)).toBeLessThan(0.5);
  });

  it('gives identical runs, yield and spreads for the same seed in chunks of 1, 4 and all 6 runs, and other runs for another seed', () => {
    const whole = monteCarlo({ sigmaRad: 0.02, runs: 6, seed: 3, chunkSize: 6 });
    for (const chunkSize of [1, 4]) {
      const pieces = monteCarlo({ sigmaRad: 0.02, runs: 6, seed: 3, chunkSize });
      expect(pieces).toEqual(whole);
      expect(summariseMonteCarlo(pieces)).toEqual(summariseMonteCarlo(whole));
    }
    const rejections = whole.map((r) => r.figures.rejectionDb);
    expect(new Set(rejections).size).toBe(6);
    const otherSeed = monteCarlo({ sigmaRad: 0.02, runs: 6, seed: 4, chunkSize: 6 }).map((r) => r.figures.rejectionDb);
    expect(otherSeed.filter((x, k) => x === rejections[k])).toEqual([]);
  });

  it('ranks the ring coupler among the three gate errors that matter most', () => {
    const list = gateSensitivities(study(0));
    const coupler = result.circuit.couplers[0]!.gate;
    const rank = list.findIndex((s) => s.gate === coupler);
    expect(rank).toBeGreaterThanOrEqual(0);
    expect(rank).toBeLessThan(3);
  });
});
