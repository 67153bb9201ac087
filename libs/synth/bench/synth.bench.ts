// Benchmark of synthesis: design + placement + tuning + verification of every example spec on the demo chip,
// and a 1,000-run Monte Carlo of a 4th-order coupled-ring band-pass (single thread; `hexloom yield` spreads it).
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { filterSpecSchema } from '@hexloom/contracts';
import { buildMesh, emptyConfiguration, type MeshDefinition } from '@hexloom/mesh';
import { designCircuit, MONTE_CARLO_DENSITY, planMonteCarlo, runMonteCarloChunk, specYieldTrial, summariseMonteCarlo, synthesise, verificationOffsets, yieldTrial, type MaskRegion } from '../src/index.js';

const examples = fileURLToPath(new URL('../../../examples/synth/', import.meta.url));
const definition = JSON.parse(readFileSync(join(examples, 'demo-chip.mesh.json'), 'utf8')) as MeshDefinition;
const mesh = buildMesh(definition);
const empty = emptyConfiguration(definition);
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;

/** Headline figures for the root `npm run bench` table. */
const headline: { library: string; measure: string; value: number; unit: string }[] = [];

console.log('Synthesis on the demo chip (12 x 8 cells), median of 5 runs');
console.log('spec file                       | design ms | synthesise ms (place + tune + simulate + checks) | points | verdict');
for (const file of readdirSync(examples).filter((f) => f.endsWith('.spec.json')).sort()) {
  const spec = filterSpecSchema.parse(JSON.parse(readFileSync(join(examples, file), 'utf8')));
  const design: number[] = [];
  const whole: number[] = [];
  let points = 0;
  let verdict = '';
  for (let i = 0; i < 5; i++) {
    let t = performance.now();
    designCircuit(spec.spec, definition.technology);
    design.push(performance.now() - t);
    t = performance.now();
    const r = synthesise({ spec, mesh, configuration: empty, circuitId: 'bench' });
    whole.push(performance.now() - t);
    points = r.ok ? (r.verification[0]?.response.frequencyHz.length ?? 0) : 0;
    verdict = r.ok ? `${r.verdict.pass ? 'pass' : 'FAIL'} (${r.verdict.checkCount} checks on ${r.verification.length} outputs)` : `refused: ${r.reason}`;
  }
  headline.push({ library: 'synth', measure: `synthesise ${file.replace('.spec.json', '')} (${verdict})`, value: median(whole), unit: 'ms' });
  console.log(`${file.padEnd(31)} | ${median(design).toFixed(2).padStart(9)} | ${median(whole).toFixed(1).padStart(48)} | ${String(points).padStart(6)} | ${verdict}`);
}

const bandPass = filterSpecSchema.parse({
  schemaVersion: 1,
  name: '4th-order Chebyshev band-pass (bench)',
  spec: { kind: 'coupled-ring-bandpass', from: 'W11', to: 'E11', through: 'W14', response: 'chebyshev', order: 4, rippleDb: 0.1, bandwidthHz: 1.2e9, centreOffsetHz: 2e9 },
  mask: { regions: [{ kind: 'pass', range: { fromHz: 1.6e9, toHz: 2.4e9 }, maxRippleDb: 2 }, { kind: 'stop', range: { fromHz: 5e9, toHz: 7e9 }, minRejectionDb: 30 }] },
});
const placed = synthesise({ spec: bandPass, mesh, configuration: empty, circuitId: 'bp4' });
if (!placed.ok) throw new Error(placed.message);
const { design, unitDelayS } = designCircuit(bandPass.spec, definition.technology);
const mask = bandPass.mask.regions as MaskRegion[];
const id = (name: string): string => mesh.ports[mesh.portIndex.get(name) as number]?.id as string;
const heapBefore = process.memoryUsage().heapUsed;
const t0 = performance.now();
const trial = yieldTrial({ mesh, configuration: placed.configuration, from: id('W11'), to: id('E11'), offsetsHz: verificationOffsets(design, mask, unitDelayS, MONTE_CARLO_DENSITY), mask, tolerance: { couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 } });
const runs = planMonteCarlo({ runs: 1000, seed: 1, chunkSize: 100 }).flatMap((chunk) => runMonteCarloChunk(chunk, trial));
const seconds = (performance.now() - t0) / 1000;
const summary = summariseMonteCarlo(runs);
const t1 = performance.now();
const specTrial = specYieldTrial({ mesh, configuration: placed.configuration, spec: bandPass, circuitId: 'bp4', tolerance: { couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 } });
const specRuns = planMonteCarlo({ runs: 200, seed: 1, chunkSize: 100 }).flatMap((chunk) => runMonteCarloChunk(chunk, specTrial));
const specSeconds = (performance.now() - t1) / 1000;
console.log('');
console.log(`Monte Carlo against the whole spec (both outputs, mask + targets), same band-pass: 200 runs in ${specSeconds.toFixed(2)} s = ${(200 / specSeconds).toFixed(0)} runs/s; yield ${(100 * summariseMonteCarlo(specRuns).yield).toFixed(1)} %`);
console.log(`Monte Carlo, ${bandPass.name}: 1,000 runs in ${seconds.toFixed(2)} s on one thread = ${(1000 / seconds).toFixed(0)} runs/s; yield ${(100 * summary.yield).toFixed(1)} %; heap +${((process.memoryUsage().heapUsed - heapBefore) / 1e6).toFixed(1)} MB`);
headline.push({ library: 'synth', measure: 'Monte Carlo against the whole spec, one thread', value: 200 / specSeconds, unit: 'runs/s' });
headline.push({ library: 'synth', measure: 'Monte Carlo against a mask, one thread', value: 1000 / seconds, unit: 'runs/s' });
console.log(`bench-summary: ${JSON.stringify(headline)}`);
