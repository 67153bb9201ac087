/** Shortest path between two external ports by length or by loss: Dijkstra on the port graph. */
import { bidirectional } from 'graphology-shortest-path/dijkstra.js';
import { buildPortGraph } from './port-graph.js';
import type { ResolvedStep } from './resolve-circuit.js';
import type { RouteSpace } from './route-space.js';
import { shortestWalk, type WalkResult } from './walks.js';

/** Which figure a shortest path minimises. */
export type PathMetric = 'length' | 'loss';

/**
 * By loss: Dijkstra (bidirectional, graphology-shortest-path) from `source:A` to `sink:B`, with arcs the
 * space forbids weighted Infinity; this is the shortest-path-on-the-tunable-unit-graph routing
 * formulation for hexagonal meshes (López et al., Opt. Express 28(1):737, 2020). A path that
 * conflicts with itself falls back to the bounded exact-length search. By length: breadth-first
 * bounds and the exact-length search at the least length.
 */
export function shortestByMetric(space: RouteSpace, fromPort: number, toPort: number, metric: PathMetric, what: string): WalkResult {
  const mesh = space.mesh;
  // By length every arc weighs one unit: a breadth-first search on the index tables gives the same
  // shortest length as Dijkstra, an order of magnitude faster on large meshes.
  if (metric === 'length') return shortestWalk(space, mesh.ports[fromPort]!.gatePort, [mesh.ports[toPort]!.gatePort], what);
  const graph = buildPortGraph(mesh);
  const a = mesh.ports[fromPort]!;
  const b = mesh.ports[toPort]!;
  const nodes = bidirectional(graph, `source:${a.id}`, `sink:${b.id}`, (_e, arc) => {
    if (arc.kind === 'bar' || arc.kind === 'cross') return space.canUse(arc.inPort, arc.outPort) ? arc.lossDb + 1e-9 : Infinity;
    return arc.lossDb;
  });
  if (nodes && nodes.length > 0) {
    const steps: ResolvedStep[] = [];
    let ok = true;
    for (let i = 0; i + 1 < nodes.length; i++) {
      const arc = graph.getEdgeAttributes(graph.edge(nodes[i]!, nodes[i + 1]!)!);
      if (arc.kind !== 'bar' && arc.kind !== 'cross') continue;
      if (!space.canUse(arc.inPort, arc.outPort)) {
        ok = false;
        break;
      }
      space.use(arc.inPort, arc.outPort);
      steps.push({ gate: arc.inPort >> 2, inPort: arc.inPort, outPort: arc.outPort });
    }
    space.releaseAll(steps);
    if (ok && steps.length > 0) return { ok: true, steps };
  }
  return shortestWalk(space, a.gatePort, [b.gatePort], what);
}
