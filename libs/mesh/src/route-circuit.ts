/** Routes one requested circuit on what the other circuits leave free; returns the circuit or a reason. */
import { crossKappa, draftToCircuit, gateTerminal, portTerminal, type CircuitDraft } from './circuit-draft.js';
import type { Circuit, CircuitKind } from './configuration.js';
import type { GateSetting } from './gate-state.js';
import type { Mesh } from './mesh.js';
import { gateNeeds } from './gate-needs.js';
import { resolveCircuit } from './resolve-circuit.js';
import { settingOfNeed } from './settle-gates.js';
import { routeAddDrop } from './route-add-drop.js';
import { routeCoupledRings } from './route-coupled-rings.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import { routeMziLattice } from './route-mzi-lattice.js';
import { checkPerimeter, ringPlacements } from './route-ring.js';
import type { RouteRequest } from './route-request.js';
import { RouteSpace } from './route-space.js';
import { routeSplitterTree } from './route-splitter-tree.js';
import { routeRingsOnBus } from './route-rings-on-bus.js';
import { shortestByMetric } from './shortest-by-metric.js';
import { walkOfLength } from './walks.js';

/** A placed circuit, the gate settings it needs, and the length in units of each of its paths. */
export type RouteSuccess = { readonly ok: true; readonly circuit: Circuit; readonly settings: readonly GateSetting[]; readonly pathLengthsUnits: readonly number[] };
export type RouteResult = RouteSuccess | RouteFailure;

function portsOf(r: RouteRequest): string[] {
  switch (r.kind) {
    case 'add-drop-ring':
    case 'coupled-rings':
      return [r.from, r.to, r.drop, ...(r.add !== undefined ? [r.add] : [])];
    case 'splitter-tree':
      return [r.from, ...r.outputs.map((o) => o.port)];
    default:
      return [r.from, r.to];
  }
}

function route(mesh: Mesh, space: RouteSpace, r: RouteRequest, port: Map<string, number>): CircuitDraft | RouteFailure {
  const p = (name: string) => port.get(name)!;
  switch (r.kind) {
    case 'path':
    case 'delay-line': {
      const what = `${r.kind} ${r.from} -> ${r.to}`;
      const w =
        r.kind === 'path'
          ? shortestByMetric(space, p(r.from), p(r.to), r.metric ?? 'length', what)
          : walkOfLength(space, mesh.ports[p(r.from)]!.gatePort, [mesh.ports[p(r.to)]!.gatePort], r.lengthUnits, what, r.budget);
      if (!w.ok) return w;
      return { paths: [{ role: 'bus', from: portTerminal(mesh, p(r.from)), to: portTerminal(mesh, p(r.to)), steps: w.steps }], couplers: [] };
    }
    case 'ring': {
      const bad = checkPerimeter(r.perimeterUnits);
      if (bad) return bad;
      const gen = ringPlacements(space, { sourceIn: mesh.ports[p(r.from)]!.gatePort, targetOut: mesh.ports[p(r.to)]!.gatePort, perimeterUnits: r.perimeterUnits, budget: r.budget });
      const first = gen.next();
      if (first.done) return first.value;
      const c = first.value;
      return {
        paths: [
          { role: 'bus', from: portTerminal(mesh, p(r.from)), to: gateTerminal(c.busIn), steps: c.legIn },
          { role: 'bus', from: gateTerminal(c.busOut), to: portTerminal(mesh, p(r.to)), steps: c.legOut },
          { role: 'ring', from: gateTerminal(c.busOut ^ 2), to: gateTerminal(c.busIn ^ 2), steps: c.ring },
        ],
        couplers: [{ gate: c.coupler, role: 'ring-coupler', kappa: crossKappa(c.busIn, c.busOut, r.kappa), phaseRad: r.phaseRad ?? 0 }],
      };
    }
    case 'add-drop-ring':
      return routeAddDrop(mesh, space, { from: p(r.from), to: p(r.to), add: r.add === undefined ? undefined : p(r.add), drop: p(r.drop), perimeterUnits: r.perimeterUnits, kappa: r.kappa, dropKappa: r.dropKappa ?? r.kappa, budget: r.budget });
    case 'coupled-rings':
      return routeCoupledRings(mesh, space, { from: p(r.from), to: p(r.to), drop: p(r.drop), add: r.add === undefined ? undefined : p(r.add), rings: r.rings, kappas: r.kappas });
    case 'mzi':
    case 'mzi-lattice': {
      const deltas = r.kind === 'mzi' ? [r.lengthDifferenceUnits] : r.lengthDifferencesUnits;
      return routeMziLattice(mesh, space, { from: p(r.from), to: p(r.to), deltasUnits: deltas, kappas: r.kappas ?? deltas.concat(0).map(() => 0.5), budget: r.budget });
    }
    case 'splitter-tree':
      return routeSplitterTree(mesh, space, { from: p(r.from), outputs: r.outputs.map((o) => ({ port: p(o.port), delayUnits: o.delayUnits })), budget: r.budget });
    case 'rings-on-bus':
      return routeRingsOnBus(mesh, space, { from: p(r.from), to: p(r.to), rings: r.rings, budget: r.budget });
  }
}

/** The settings that realise a circuit: bar/cross of every traversed gate with its phase shifters, split (kappa, phase) of every coupler. */
export function circuitSettings(mesh: Mesh, circuit: Circuit): GateSetting[] {
  return [...gateNeeds(mesh, [circuit]).needs.values()].map((n) => settingOfNeed(mesh, n));
}

/**
 * Routes `request` on `mesh` next to `circuits` (already placed, left untouched). Never throws on
 * an impossible request: the answer then names the reason (wrong parity, port taken, no free area,
 * dead gates in the way, search limit).
 */
export function routeCircuit(mesh: Mesh, circuits: readonly Circuit[], request: RouteRequest): RouteResult {
  if (circuits.some((c) => c.id === request.id)) return routeFailure('duplicate-circuit', `a circuit with id ${request.id} is already placed`);
  let region: Set<number> | undefined;
  if (request.region) {
    region = new Set();
    for (const c of request.region) {
      const i = mesh.cellIndex.get(c);
      if (i === undefined) return routeFailure('invalid-request', `region cell ${c} is not a cell of this mesh`);
      region.add(i);
    }
  }
  const resolved = circuits.map((c) => resolveCircuit(mesh, c));
  const space = new RouteSpace(mesh, resolved, { region });
  const port = new Map<string, number>();
  for (const name of portsOf(request)) {
    const i = mesh.portIndex.get(name);
    if (i === undefined) return routeFailure('unknown-port', `port ${name} is not an external port of this mesh (give a port id like v(0,0)s/g(0,0)e or a label)`);
    if (space.portUsed[i]) return routeFailure('port-taken', `port ${name} is already used by another circuit`);
    if ([...port.values()].includes(i)) return routeFailure('invalid-request', `port ${name} is named twice in the request`);
    port.set(name, i);
  }
  // First keep off the entry gates of the other free ports (so that they stay reachable), then, if
  // that fails, use them too.
  const mine = new Set(port.values());
  const reserved = new Set(mesh.ports.filter((q) => !space.portUsed[q.index] && !mine.has(q.index)).map((q) => q.gatePort >> 2));
  for (const p of mine) reserved.delete(mesh.ports[p]!.gatePort >> 2);
  const polite = route(mesh, new RouteSpace(mesh, resolved, { region, reserved }), request, port);
  const draft = 'ok' in polite ? route(mesh, space, request, port) : polite;
  if ('ok' in draft) return draft;
  const circuit = draftToCircuit(mesh, draft, { id: request.id, kind: request.kind as CircuitKind, region: request.region });
  return { ok: true, circuit, settings: circuitSettings(mesh, circuit), pathLengthsUnits: draft.paths.map((p) => p.steps.length) };
}
