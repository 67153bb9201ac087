/** Places a chain of adjacent single-cell rings coupled through their shared gates, with input and output buses. */
import { axialNeighbour } from './axial.js';
import { pathDistances } from './path-distances.js';
import { cellFrame } from './cell-frame.js';
import { crossKappa, gateTerminal, portTerminal, type CircuitDraft, type DraftPath } from './circuit-draft.js';
import { legInto, legOutOf } from './legs.js';
import { cellId } from './mesh-ids.js';
import type { Mesh } from './mesh.js';
import type { ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';

export type CoupledRingsArgs = { from: number; to: number; drop: number; add: number | undefined; rings: number; kappas: readonly number[] };

/** Cap on chain placements tried per request. */
export const CHAIN_ATTEMPTS = 400;

/** The six traversals around cell c (index) on its own side, counter-clockwise (+1) or clockwise (-1). */
function loop(mesh: Mesh, c: number, orientation: 1 | -1): ResolvedStep[] {
  const f = cellFrame(mesh);
  const out: ResolvedStep[] = [];
  for (let k = 0; k < 6; k++) {
    const i = orientation === 1 ? k : (6 - k) % 6;
    const g = f.gates[c * 6 + i]!;
    const side = mesh.gates[g]!.sideCells[0] === c ? 0 : 1;
    const startVertex = f.corners[c * 6 + (orientation === 1 ? (i + 5) % 6 : i)]!;
    const e = mesh.gates[g]!.ends[0] === startVertex ? 0 : 1;
    out.push({ gate: g, inPort: (g << 2) | (side << 1) | e, outPort: (g << 2) | (side << 1) | (e ^ 1) });
  }
  return out;
}

/** Ring paths of one loop cut at its coupler gates. */
function segments(ring: ResolvedStep[], couplers: ReadonlySet<number>): DraftPath[] {
  const idx = ring.map((s, k) => (couplers.has(s.gate) ? k : -1)).filter((k) => k >= 0);
  return idx.map((a, n) => {
    const b = idx[(n + 1) % idx.length]!;
    const steps: ResolvedStep[] = [];
    for (let k = (a + 1) % 6; k !== b; k = (k + 1) % 6) steps.push(ring[k]!);
    return { role: 'ring' as const, from: gateTerminal(ring[a]!.outPort), to: gateTerminal(ring[b]!.inPort), steps };
  });
}

/** Chains `rings` cells in a straight line; kappas are bus-ring, ring-ring ..., ring-bus. */
export function routeCoupledRings(mesh: Mesh, space: RouteSpace, a: CoupledRingsArgs): CircuitDraft | RouteFailure {
  const N = a.rings;
  if (!Number.isInteger(N) || N < 1) return routeFailure('invalid-request', `ring count ${N} must be a whole number >= 1`);
  if (a.kappas.length !== N + 1) return routeFailure('invalid-request', `a chain of ${N} rings needs ${N + 1} kappas, got ${a.kappas.length}`);
  const f = cellFrame(mesh);
  // Rank chains by how close their end cells' gates are to the input and drop ports (breadth-first distances).
  const dFrom = pathDistances(space, [mesh.ports[a.from]!.gatePort]);
  const dDrop = pathDistances(space, [mesh.ports[a.drop]!.gatePort]);
  const gateScore = (d: Int32Array, g: number) => Math.min(d[g << 2]!, d[(g << 2) | 1]!, d[(g << 2) | 2]!, d[(g << 2) | 3]!);
  const cellScore = (d: Int32Array, c: number, skip: number) => Math.min(...[0, 1, 2, 3, 4, 5].filter((i) => i !== skip).map((i) => gateScore(d, f.gates[c * 6 + i]!)));
  const chains: { cells: number[]; dir: number; score: number }[] = [];
  for (const c of mesh.cells)
    for (let dir = 0; dir < 6; dir++) {
      const cells = [c.index];
      for (let k = 1; k < N; k++) {
        const i = mesh.cellIndex.get(cellId(axialNeighbour(mesh.cells[cells[k - 1]!]!, dir)));
        if (i === undefined) break;
        cells.push(i);
      }
      if (cells.length === N) chains.push({ cells, dir, score: cellScore(dFrom, cells[0]!, N > 1 ? dir : -1) + cellScore(dDrop, cells[N - 1]!, N > 1 ? (dir + 3) % 6 : -1) });
    }
  chains.sort((x, y) => x.score - y.score);
  let attempts = 0;
  let last = 'no chain of cells fits the mesh';
  for (const chain of chains) {
    for (const o of [1, -1] as const) {
      const loops = chain.cells.map((c, k) => loop(mesh, c, (k % 2 === 0 ? o : -o) as 1 | -1));
      const shared = chain.cells.slice(0, -1).map((c) => f.gates[c * 6 + chain.dir]!);
      const first = loops[0]!;
      const lastLoop = loops[N - 1]!;
      const best = (loopSteps: ResolvedStep[], d: Int32Array) =>
        loopSteps.filter((st) => !shared.includes(st.gate)).sort((x, y) => gateScore(d, x.gate) - gateScore(d, y.gate)).slice(0, 3);
      for (const gin of best(first, dFrom)) {
        for (const gout of best(lastLoop, dDrop)) {
          if (shared.includes(gout.gate) || gout.gate === gin.gate || attempts >= CHAIN_ATTEMPTS) continue;
          const couplers = new Set([gin.gate, ...shared, gout.gate]);
          if (![...couplers].every((g) => space.canSplit(g))) continue;
          const steps = loops.flat().filter((s) => !couplers.has(s.gate));
          if (!steps.every((s) => space.canUse(s.inPort, s.outPort))) continue;
          attempts++;
          couplers.forEach((g) => space.claimSplit(g));
          space.useAll(steps);
          const used: ResolvedStep[][] = [];
          // Legs are found one after another so that each sees the ones before.
          const order: (() => ReturnType<typeof legInto> | undefined)[] = [
            () => legInto(space, mesh.ports[a.from]!.gatePort, gin.inPort ^ 2, 'input bus'),
            () => legOutOf(space, gin.outPort ^ 2, mesh.ports[a.to]!.gatePort, 'through bus'),
            () => legOutOf(space, gout.outPort ^ 2, mesh.ports[a.drop]!.gatePort, 'drop bus'),
            () => (a.add === undefined ? undefined : legInto(space, mesh.ports[a.add]!.gatePort, gout.inPort ^ 2, 'add bus')),
          ];
          let ok = true;
          for (const leg of order) {
            const r = leg();
            if (r === undefined) {
              used.push([]);
              continue;
            }
            if (!r.ok) {
              ok = false;
              last = r.message;
              break;
            }
            space.useAll(r.steps);
            used.push(r.steps);
          }
          if (ok) {
            const paths: DraftPath[] = [
              { role: 'bus', from: portTerminal(mesh, a.from), to: gateTerminal(gin.inPort ^ 2), steps: used[0]! },
              { role: 'bus', from: gateTerminal(gin.outPort ^ 2), to: portTerminal(mesh, a.to), steps: used[1]! },
              { role: 'bus', from: gateTerminal(gout.outPort ^ 2), to: portTerminal(mesh, a.drop), steps: used[2]! },
            ];
            if (a.add !== undefined) paths.push({ role: 'bus', from: portTerminal(mesh, a.add), to: gateTerminal(gout.inPort ^ 2), steps: used[3]! });
            for (const l of loops) paths.push(...segments(l, couplers));
            // Ring traversals around their own cell are bar, so the requested kappas are the cross-couplings.
            const nominal = [gin, ...shared.map((g) => loops.flat().find((st) => st.gate === g)!), gout];
            return { paths, couplers: nominal.map((st, k) => ({ gate: st.gate, role: k === 0 || k === N ? 'ring-coupler' : 'ring-ring', kappa: crossKappa(st.inPort, st.outPort, a.kappas[k]!), phaseRad: 0 })) };
          }
          for (const u of used) space.releaseAll(u);
          space.releaseAll(steps);
          couplers.forEach((g) => space.releaseSplit(g));
        }
      }
    }
    if (attempts >= CHAIN_ATTEMPTS) break;
  }
  return routeFailure(attempts >= CHAIN_ATTEMPTS ? 'search-limit' : 'not-enough-free-area', `chain of ${N} coupled rings: no free straight chain of cells with buses to the ports (${attempts} tried; last: ${last})`);
}
