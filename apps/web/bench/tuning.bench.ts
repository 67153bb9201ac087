// Benchmark of live tuning in the browser: redraw computations per second on the 12 x 8 demo chip at 1,024 points.
import { readFileSync } from 'node:fs';
import { type ConfigurationFile, filterSpecSchema, meshDefinitionSchema } from '@hexloom/contracts';
import { buildMesh, emptyConfiguration } from '@hexloom/mesh';
import { synthesise } from '@hexloom/synth';
import { computeSpectra } from '../src/modules/response/utils/computeSpectra.js';
import { setCouplerKappa } from '../src/modules/response/utils/setCouplerKappa.js';

const read = (path: string): unknown => JSON.parse(readFileSync(new URL(path, import.meta.url), 'utf8'));
const definition = meshDefinitionSchema.parse(read('../../../examples/synth/demo-chip.mesh.json'));
const spec = filterSpecSchema.parse(read('../../../examples/synth/coupled-ring-bandpass.spec.json'));
const mesh = buildMesh(definition);
const designed = synthesise({ spec, mesh, configuration: emptyConfiguration(definition, 'bar'), circuitId: 'bandpass' });
if (!designed.ok) throw new Error(`tuning bench: the demo band-pass could not be synthesised: ${designed.message}`);
const base = designed.configuration as ConfigurationFile;
const circuit = base.circuits.find((c) => c.id === 'bandpass');
const gate = circuit?.couplers[0]?.gate;
const kappa0 = circuit?.couplers[0]?.kappa ?? 0.5;
if (!gate) throw new Error('tuning bench: the demo band-pass has no coupler to drag');

/** One redraw as the worker does it: a new content (one kappa moved), then the spectra of every plotted pair. */
const GRIDS = [
  { name: 'span -20..+20 GHz, 1,024 points (direct sum)', grid: { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 1024 } },
  { name: 'one FSR, 1,024 points (FFT)', grid: { kind: 'fsr', points: 1024 } },
] as const;
const PAIRS = [{ from: 'W11', to: 'E11' }, { from: 'W11', to: 'W14' }];

console.log(`live tuning benchmark (apps/web), Node ${process.version}, ${new Date().toISOString().slice(0, 10)}`);
console.log(`demo chip 12 x 8 (${mesh.gates.length} gates), circuit bandpass, dragging the kappa of ${gate}, pairs ${PAIRS.map((p) => `${p.from} -> ${p.to}`).join(', ')}`);
const summary: { library: string; measure: string; value: number; unit: string }[] = [];
for (const { name, grid } of GRIDS) {
  for (const pairs of [PAIRS.slice(0, 1), PAIRS]) {
    let content = base;
    const step = (k: number) => {
      content = setCouplerKappa(content, 'bandpass', gate, Math.min(1, Math.max(0, kappa0 + 0.002 * Math.sin(k))));
      return computeSpectra({ content, pairs, grid });
    };
    for (let k = 0; k < 5; k++) step(k); // JIT warm-up
    const times: number[] = [];
    let steps = 0;
    const started = performance.now();
    while (performance.now() - started < 3_000 || steps < 20) {
      const t0 = performance.now();
      const [first] = step(steps);
      times.push(performance.now() - t0);
      if (!first?.run.converged) console.log(`  warning: ${first?.run.warning}`);
      steps++;
    }
    times.sort((a, b) => a - b);
    const median = times[Math.floor(times.length / 2)] ?? NaN;
    const perSecond = 1000 / median;
    console.log(`${name}, ${pairs.length} pair(s): median ${median.toFixed(1)} ms per redraw, ${perSecond.toFixed(1)} redraws/s (${steps} redraws, p90 ${(times[Math.floor(times.length * 0.9)] ?? NaN).toFixed(1)} ms)`);
    if (pairs.length === 2) summary.push({ library: 'apps/web', measure: `live tuning redraws, demo chip, 2 pairs, ${grid.kind === 'fsr' ? 'FSR FFT' : 'span'} 1,024 pts`, value: perSecond, unit: 'redraws/s' });
  }
}
console.log(`bench-summary: ${JSON.stringify(summary)}`);
