// Benchmark of the solver: fast route vs dense reference vs a numpy peer, and the fast route on large chips.
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { emptyConfiguration, MESH_SCHEMA_VERSION, placeCircuit, type Configuration, type Mesh, type MeshShape, type RouteRequest } from '@hexloom/mesh';
import { gridOffsetsHz, impulseResponse, netlistFromMesh, referenceResponse, spectrumFromImpulse, type MeshNetlist } from '../src/index.js';
import { DEMO_TECH, meshWithIo, spreadConfiguration } from '../test/mesh-fixtures.js';

const PEER = fileURLToPath(new URL('./numpy-peer.py', import.meta.url));
const ms = (t0: number): number => performance.now() - t0;
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? NaN;

/** Fast route for one pair on a full FSR grid: impulse response, then three FFTs (H, n h, n^2 h). */
function fastRoute(chip: MeshNetlist, from: string, to: string, points: number) {
  const q = chip.netlist.outputPorts.indexOf(to);
  const ir = impulseResponse(chip.netlist, from);
  const spectrum = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'fsr', points }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
  return { ir, spectrum };
}

function timeFast(chip: MeshNetlist, from: string, to: string, points: number, repeats: number) {
  const times: number[] = [];
  let last = fastRoute(chip, from, to, points);
  for (let i = 0; i < 5; i++) last = fastRoute(chip, from, to, points); // JIT warm-up
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    last = fastRoute(chip, from, to, points);
    times.push(ms(t0));
  }
  return { ms: median(times), ...last };
}

function numpyPeer(chip: MeshNetlist, mesh: Mesh, from: string, to: string, omegas: number[]) {
  const endIndex = (e: { gate: string; waveguide: number; end: number }): number => 4 * mesh.gateIndex.get(e.gate)! + 2 * e.waveguide + e.end;
  const body = {
    gates: chip.network.gates.map((g) => [...g.transfer]),
    joins: chip.network.joins.map(([p, q]) => [endIndex(p), endIndex(q)]),
    ports: chip.network.ports.map((p) => endIndex(p.at)),
    from: chip.network.ports.findIndex((p) => p.port === from),
    to: chip.network.ports.findIndex((p) => p.port === to),
    omegas,
  };
  // One BLAS thread: on a small shared machine, oversubscribed BLAS threads only slow the peer down.
  const env = { ...process.env, OPENBLAS_NUM_THREADS: '1', OMP_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  const out = execFileSync('/usr/bin/python3', [PEER], { input: JSON.stringify(body), encoding: 'utf8', maxBuffer: 256 << 20, env });
  return JSON.parse(out) as { hRe: number[]; hIm: number[]; seconds: number };
}

const row = (cells: (string | number)[]): string => cells.map((c) => String(c).padEnd(16)).join('');
const fmt = (x: number, d = 1): string => (Number.isFinite(x) ? x.toFixed(d) : String(x));

{
  console.log(`solver benchmark, Node ${process.version}, ${new Date().toISOString().slice(0, 10)}`);
}

/** Headline figures for the root `npm run bench` table. */
const summary: { library: string; measure: string; value: number; unit: string }[] = [];

console.log('\n1. Fast route vs dense reference (mathjs) vs numpy peer, 1,024 points over one unit FSR');
console.log(row(['chip', 'gates', 'fast ms', 'steps', 'numpy ms', 'speed-up', 'max |dH| np', 'ref ms/pt', 'ref 1024 (proj.)', 'max |dH| ref']));
for (const [name, radius, refPoints] of [['radius-1', 1, 16], ['radius-2', 2, 4]] as const) {
  const mesh = meshWithIo({ kind: 'hexagon', radius }, DEMO_TECH, 2);
  const chip = netlistFromMesh({ mesh, configuration: spreadConfiguration(mesh) });
  const from = chip.netlist.inputPorts[0]!, to = chip.netlist.outputPorts[3]!;
  const fast = timeFast(chip, from, to, 1024, 21);
  const offsets = gridOffsetsHz({ kind: 'fsr', points: 1024 }, chip.unitDelayS);
  const omegas = [...offsets].map((f) => 2 * Math.PI * f * chip.unitDelayS);
  const peer = numpyPeer(chip, mesh, from, to, omegas);
  let dNp = 0;
  peer.hRe.forEach((re, i) => (dNp = Math.max(dNp, Math.hypot(re - fast.spectrum.re[i]!, peer.hIm[i]! - fast.spectrum.im[i]!))));
  // The mathjs reference costs ~0.1-2 s per point here: time it on evenly spaced points and project to 1,024.
  const pick = Float64Array.from({ length: refPoints }, (_, k) => offsets[Math.floor((k * 1024) / refPoints)]!);
  const t0 = performance.now();
  const ref = referenceResponse(chip.netlist, from, pick, chip.unitDelayS);
  const refMsPerPoint = ms(t0) / refPoints;
  const q = chip.netlist.outputPorts.indexOf(to);
  let dRef = 0;
  pick.forEach((_, k) => {
    const i = Math.floor((k * 1024) / refPoints);
    dRef = Math.max(dRef, Math.hypot(ref.re[q]![k]! - fast.spectrum.re[i]!, ref.im[q]![k]! - fast.spectrum.im[i]!));
  });
  console.log(row([name, mesh.gates.length, fmt(fast.ms, 2), fast.ir.steps, fmt(peer.seconds * 1e3), `${fmt((peer.seconds * 1e3) / fast.ms, 0)}x`, dNp.toExponential(1), fmt(refMsPerPoint), `${fmt((refMsPerPoint * 1024) / 1e3)} s`, dRef.toExponential(1)]));
  summary.push({ library: 'solver', measure: `speed-up over the dense numpy peer, ${name}, 1,024 points`, value: (peer.seconds * 1e3) / fast.ms, unit: 'x' });
}

/** Places circuits one after another; returns the configuration and what was placed. */
function placeAll(mesh: Mesh, requests: RouteRequest[]): { configuration: Configuration; placed: string[] } {
  let configuration = emptyConfiguration(mesh.definition);
  const placed: string[] = [];
  for (const r of requests) {
    const result = placeCircuit(configuration, r, mesh);
    if (result.ok) {
      configuration = result.configuration;
      placed.push(`${r.id} (${r.kind})`);
    } else placed.push(`${r.id} not placed: ${result.reason}`);
  }
  return { configuration, placed };
}

function bigChip(shape: MeshShape, everyNth: number): Mesh {
  return meshWithIo(shape, DEMO_TECH, everyNth);
}

console.log('\n2. Fast route alone on large chips (every gate simulated, parked gates leak at 25 dB extinction)');
console.log(row(['chip', 'gates', 'points', 'fast ms', 'steps', 'residual', 'state MB', 'rss MB', 'circuits']));
for (const [name, shape, points, everyNth] of [
  ['12x8 demo', { kind: 'rectangle', rows: 8, columns: 12 } as MeshShape, 4096, 3],
  ['30x30', { kind: 'rectangle', rows: 30, columns: 30 } as MeshShape, 16384, 6],
] as const) {
  const mesh = bigChip(shape, everyNth);
  const p = mesh.ports.map((x) => x.id);
  const { configuration, placed } = placeAll(mesh, [
    { id: 'notch', kind: 'ring', from: p[0]!, to: p[3]!, perimeterUnits: 6, kappa: 0.1 },
    { id: 'mzi', kind: 'mzi', from: p[6]!, to: p[9]!, lengthDifferenceUnits: 2 },
    { id: 'delay', kind: 'delay-line', from: name === '30x30' ? p[12]! : p[10]!, to: name === '30x30' ? p[17]! : p[14]!, lengthUnits: name === '30x30' ? 80 : 29 },
  ]);
  const chip = netlistFromMesh({ mesh, configuration });
  const fast = timeFast(chip, p[0]!, p[3]!, points, 5);
  // Working memory of one run: 4 state arrays + 2 activity lists per slot, h[n] of every output port, 6 FFT buffers.
  const slots = chip.netlist.stageCount * 2;
  const stateMb = (slots * 4 * 8 + chip.netlist.stageCount * 3 * 4 + chip.netlist.outputPorts.length * fast.ir.steps * 16 + points * 6 * 16) / 2 ** 20;
  const rssMb = process.memoryUsage().rss / 2 ** 20;
  summary.push({ library: 'solver', measure: `fast route, ${name}, ${points} points`, value: fast.ms, unit: 'ms' });
  console.log(row([name, mesh.gates.length, points, fmt(fast.ms, 1), fast.ir.steps, fast.ir.residualEnergy.toExponential(1), fmt(stateMb), fmt(rssMb, 0), placed.join('; ')]));
}
console.log(`\nmesh schema ${MESH_SCHEMA_VERSION}; fast route = impulse response (energy tolerance 1e-24) + 3 FFTs; median of repeats.`);
console.log(`bench-summary: ${JSON.stringify(summary)}`);
