/** Places several all-pass rings in series on one bus (delay equalisers, cascaded notches). */
import { crossKappa, gateTerminal, portTerminal, type CircuitDraft, type DraftCoupler, type DraftPath } from './circuit-draft.js';
import { linksOn } from './legs.js';
import type { Mesh } from './mesh.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import { checkPerimeter, ringPlacements } from './route-ring.js';
import type { RouteSpace } from './route-space.js';

export type RingsOnBusArgs = {
  from: number;
  to: number;
  rings: readonly { readonly perimeterUnits: number; readonly kappa: number }[];
  budget?: number | undefined;
};

/**
 * Greedy, ring by ring from the input: each ring takes the best placement between where the bus stands and
 * the output port; the bus leg after an intermediate ring is given back so the next ring can be coupled along
 * it. Fails with the reason of the first ring that finds no place.
 */
export function routeRingsOnBus(mesh: Mesh, space: RouteSpace, a: RingsOnBusArgs): CircuitDraft | RouteFailure {
  if (a.rings.length < 1) return routeFailure('invalid-request', 'rings on a bus need at least one ring');
  for (const ring of a.rings) {
    const bad = checkPerimeter(ring.perimeterUnits);
    if (bad) return bad;
  }
  const target = mesh.ports[a.to]!.gatePort;
  let source = mesh.ports[a.from]!.gatePort;
  let from = portTerminal(mesh, a.from);
  const paths: DraftPath[] = [];
  const couplers: DraftCoupler[] = [];
  for (let k = 0; k < a.rings.length; k++) {
    const ring = a.rings[k]!;
    const last = k === a.rings.length - 1;
    const first = ringPlacements(space, { sourceIn: source, targetOut: target, perimeterUnits: ring.perimeterUnits, budget: a.budget }).next();
    if (first.done) return routeFailure(first.value.reason, `ring ${k + 1} of ${a.rings.length} on the bus: ${first.value.message}`);
    const c = first.value;
    paths.push({ role: 'bus', from, to: gateTerminal(c.busIn), steps: c.legIn });
    paths.push({ role: 'ring', from: gateTerminal(c.busOut ^ 2), to: gateTerminal(c.busIn ^ 2), steps: c.ring });
    couplers.push({ gate: c.coupler, role: 'ring-coupler', kappa: crossKappa(c.busIn, c.busOut, ring.kappa), phaseRad: 0 });
    if (last) {
      paths.push({ role: 'bus', from: gateTerminal(c.busOut), to: portTerminal(mesh, a.to), steps: c.legOut });
      break;
    }
    space.releaseAll(c.legOut);
    if (c.busOut === target || !linksOn(space, c.busOut)) return routeFailure('not-enough-free-area', `ring ${k + 1} of ${a.rings.length} sits at the output port; no room for the next ring on the bus`);
    source = mesh.link[c.busOut]!;
    from = gateTerminal(c.busOut);
  }
  return { paths, couplers };
}
