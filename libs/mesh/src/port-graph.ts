/** The port-level directed graph (graphology): gate ports as nodes, gate traversals and links as arcs. */
import { DirectedGraph } from 'graphology';
import { gatePortLabel, type Mesh } from './mesh.js';

/** Node of the port graph: light entering (`in`) or leaving (`out`) a gate at a gate port, or an external port as source or sink. */
export type PortGraphNode = { readonly kind: 'in' | 'out'; readonly gatePort: number } | { readonly kind: 'source' | 'sink'; readonly port: number };

/** Arc of the port graph: a gate traversal (bar or cross, one unit) or a zero-length corner link, bend or port connection. */
export type PortGraphArc = {
  readonly kind: 'bar' | 'cross' | 'corner' | 'bend' | 'external';
  readonly lengthUnits: number;
  readonly lossDb: number;
  /** For traversals: the gate ports entered and left. */
  readonly inPort: number;
  readonly outPort: number;
};

export type PortGraph = DirectedGraph<PortGraphNode, PortGraphArc>;

/** Key of the node where light enters (`in`) or leaves (`out`) a gate at gate port `p`: `in:g(0,0)e:a0`. */
export function portGraphKey(mesh: Mesh, direction: 'in' | 'out', p: number): string {
  return `${direction}:${mesh.gates[p >> 2]!.id}:${gatePortLabel(p)}`;
}

const cache = new WeakMap<Mesh, PortGraph>();

/**
 * Builds (once per mesh, then cached) the port graph. External port P has nodes `source:P` and
 * `sink:P`. Traversal arcs of dead gates are present; routers skip them.
 */
export function buildPortGraph(mesh: Mesh): PortGraph {
  const hit = cache.get(mesh);
  if (hit) return hit;
  const graph: PortGraph = new DirectedGraph<PortGraphNode, PortGraphArc>();
  const n = mesh.link.length;
  for (let p = 0; p < n; p++) {
    graph.addNode(portGraphKey(mesh, 'in', p), { kind: 'in', gatePort: p });
    graph.addNode(portGraphKey(mesh, 'out', p), { kind: 'out', gatePort: p });
  }
  const bendLossDb = mesh.definition.technology.bendLossDb;
  for (let p = 0; p < n; p++) {
    const g = mesh.gates[p >> 2]!;
    const inKey = portGraphKey(mesh, 'in', p);
    for (let side = 0; side < 2; side++) {
      const out = (g.index << 2) | (side << 1) | ((p & 1) ^ 1);
      const kind = side === ((p >> 1) & 1) ? 'bar' : 'cross';
      graph.addDirectedEdge(inKey, portGraphKey(mesh, 'out', out), { kind, lengthUnits: 1, lossDb: g.lossDb, inPort: p, outPort: out });
    }
    const kind = mesh.linkKind[p]!;
    if (kind === 'corner' || kind === 'bend')
      graph.addDirectedEdge(portGraphKey(mesh, 'out', p), portGraphKey(mesh, 'in', mesh.link[p]!), { kind, lengthUnits: 0, lossDb: kind === 'bend' ? bendLossDb : 0, inPort: -1, outPort: -1 });
  }
  for (const port of mesh.ports) {
    graph.addNode(`source:${port.id}`, { kind: 'source', port: port.index });
    graph.addNode(`sink:${port.id}`, { kind: 'sink', port: port.index });
    graph.addDirectedEdge(`source:${port.id}`, portGraphKey(mesh, 'in', port.gatePort), { kind: 'external', lengthUnits: 0, lossDb: 0, inPort: -1, outPort: -1 });
    graph.addDirectedEdge(portGraphKey(mesh, 'out', port.gatePort), `sink:${port.id}`, { kind: 'external', lengthUnits: 0, lossDb: 0, inPort: -1, outPort: -1 });
  }
  cache.set(mesh, graph);
  return graph;
}
