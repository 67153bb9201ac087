// Mesh engine benchmark: graph build, shortest paths, exact-length routes and ring placements on
// 12x8, 30x30 and 60x60 meshes. Run: npx tsx libs/mesh/bench/mesh.bench.ts (prints a Markdown table).
import { buildMesh, buildPortGraph, DEMO_TECHNOLOGY, emptyConfiguration, makeMeshDefinition, routeCircuit, type Mesh } from '../src/index.js';

const TECH = DEMO_TECHNOLOGY;

/** Seeded linear congruential generator (Numerical Recipes constants) so runs are repeatable. */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const ms = (t0: number) => performance.now() - t0;
const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x.toFixed(1));
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? Number.NaN;

function westEast(mesh: Mesh): { west: string[]; east: string[] } {
  const x = (id: string) => {
    const m = /^v\((-?\d+),(-?\d+)\)/.exec(id)!;
    return Number(m[1]) + Number(m[2]) / 2;
  };
  const xs = mesh.ports.map((p) => x(p.site));
  const mid = (Math.min(...xs) + Math.max(...xs)) / 2;
  return { west: mesh.ports.filter((_p, i) => xs[i]! < mid).map((p) => p.id), east: mesh.ports.filter((_p, i) => xs[i]! >= mid).map((p) => p.id) };
}

function bench(rows: number, columns: number, queries: number): string[] {
  const heap0 = process.memoryUsage().heapUsed;
  let t0 = performance.now();
  const definition = makeMeshDefinition({ name: `${columns}x${rows}`, shape: { kind: 'rectangle', rows, columns }, technology: TECH });
  const mesh = buildMesh(definition);
  const buildMs = ms(t0);
  t0 = performance.now();
  const graph = buildPortGraph(mesh);
  const graphMs = ms(t0);
  const heapMb = (process.memoryUsage().heapUsed - heap0) / 2 ** 20;
  const { west, east } = westEast(mesh);
  const rnd = lcg(rows * 1000 + columns);
  const pick = (xs: string[]) => xs[Math.floor(rnd() * xs.length)]!;
  const empty = emptyConfiguration(definition);
  t0 = performance.now();
  let found = 0;
  for (let i = 0; i < queries; i++) {
    const r = routeCircuit(mesh, empty.circuits, { kind: 'path', id: 'q', from: pick(west), to: pick(east) });
    if (r.ok) found++;
  }
  const spMs = ms(t0);
  const a = west[Math.floor(west.length / 2)]!;
  const b = east[Math.floor(east.length / 2)]!;
  const shortest = routeCircuit(mesh, [], { kind: 'path', id: 's', from: a, to: b });
  const dMin = shortest.ok ? shortest.pathLengthsUnits[0]! : 0;
  const exact = [1, 2, 4].map((k) => {
    const L = dMin * k;
    const lengthUnits = L + ((L - dMin) % 2);
    const t = performance.now();
    const r = routeCircuit(mesh, [], { kind: 'delay-line', id: 'd', from: a, to: b, lengthUnits });
    if (k === 4) summary.push({ library: 'mesh', measure: `delay line of 4x the least length, ${columns} x ${rows}`, value: ms(t), unit: 'ms' });
    return `${lengthUnits} u: ${fmt(ms(t))} ms${r.ok ? '' : ` (${r.reason})`}`;
  });
  summary.push({ library: 'mesh', measure: `shortest path, ${columns} x ${rows}`, value: spMs / queries, unit: 'ms' });
  const rings = [6, 10, 18].map((perimeterUnits) => {
    const times: number[] = [];
    let ok = 0;
    for (let i = 0; i < 5; i++) {
      const t = performance.now();
      const r = routeCircuit(mesh, [], { kind: 'ring', id: 'r', from: pick(west), to: pick(east), perimeterUnits, kappa: 0.1 });
      times.push(ms(t));
      if (r.ok) ok++;
    }
    if (perimeterUnits === 6) summary.push({ library: 'mesh', measure: `6-unit ring placement, ${columns} x ${rows}`, value: median(times), unit: 'ms' });
    return `${perimeterUnits} u: ${fmt(median(times))} ms (${ok}/5)`;
  });
  return [
    `${columns} x ${rows}`,
    `${mesh.gates.length} gates, ${graph.order} nodes, ${graph.size} arcs`,
    `${fmt(buildMs)} ms + graph ${fmt(graphMs)} ms`,
    `${queries}: ${fmt(spMs)} ms (${fmt(spMs / queries)} ms each, ${found} found)`,
    exact.join('; '),
    rings.join('; '),
    `${fmt(heapMb)} MB`,
  ];
}

/** Headline figures for the root `npm run bench` table. */
const summary: { library: string; measure: string; value: number; unit: string }[] = [];

const header = ['mesh (columns x rows)', 'size', 'build', 'shortest-path queries', 'exact length 1x / 2x / 4x min', 'ring placement (median of 5)', 'heap after build'];
process.stdout.write(`| ${header.join(' | ')} |\n|${header.map(() => '---').join('|')}|\n`);
for (const [r, c] of [[8, 12], [30, 30], [60, 60]] as const) process.stdout.write(`| ${bench(r, c, 1000).join(' | ')} |\n`);
process.stdout.write(`\nNode ${process.version}, ${new Date().toISOString().slice(0, 10)}\n`);
process.stdout.write(`bench-summary: ${JSON.stringify(summary)}\n`);
