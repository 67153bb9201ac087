/** Places an add-drop ring: an all-pass ring whose loop carries a second split gate to a drop bus. */
import { crossKappa, gateTerminal, portTerminal, type CircuitDraft } from './circuit-draft.js';
import { legInto, legOutOf } from './legs.js';
import type { Mesh } from './mesh.js';
import { pathDistances } from './path-distances.js';
import { checkPerimeter, ringPlacements } from './route-ring.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';

export type AddDropArgs = { from: number; to: number; add: number | undefined; drop: number; perimeterUnits: number; kappa: number; dropKappa: number; budget?: number | undefined };

/** Ring of `perimeterUnits` (both couplers included) between bus from->to and bus add->drop. */
export function routeAddDrop(mesh: Mesh, space: RouteSpace, a: AddDropArgs): CircuitDraft | RouteFailure {
  const bad = checkPerimeter(a.perimeterUnits);
  if (bad) return bad;
  const src = mesh.ports[a.from]!.gatePort;
  // Pull the ring towards the drop bus so that the second bus need not cross the first.
  const bias = pathDistances(space, [mesh.ports[a.drop]!.gatePort]);
  const gen = ringPlacements(space, { sourceIn: src, targetOut: mesh.ports[a.to]!.gatePort, perimeterUnits: a.perimeterUnits, budget: a.budget, bias, maxCandidates: 400 });
  let last: RouteFailure = routeFailure('not-enough-free-area', 'add-drop ring: no placement');
  let r = gen.next();
  for (; !r.done; r = gen.next()) {
    const p = r.value;
    // Try each ring gate as the drop coupler, the drop bus using its other waveguide in the ring's direction.
    for (let k = 0; k < p.ring.length; k++) {
      const s = p.ring[k]!;
      space.release(s.inPort, s.outPort);
      if (space.canSplit(s.gate)) {
        space.claimSplit(s.gate);
        // The drop bus first (it is required), then the optional add bus on what is left.
        const dropOut = legOutOf(space, s.outPort ^ 2, mesh.ports[a.drop]!.gatePort, 'drop bus');
        let addIn: ReturnType<typeof legInto> = { ok: true, steps: [] };
        if (dropOut.ok && a.add !== undefined) {
          space.useAll(dropOut.steps);
          addIn = legInto(space, mesh.ports[a.add]!.gatePort, s.inPort ^ 2, 'add bus');
          space.releaseAll(dropOut.steps);
        }
        if (dropOut.ok && addIn.ok) {
            const paths: CircuitDraft['paths'][number][] = [
              { role: 'bus', from: portTerminal(mesh, a.from), to: gateTerminal(p.busIn), steps: p.legIn },
              { role: 'bus', from: gateTerminal(p.busOut), to: portTerminal(mesh, a.to), steps: p.legOut },
              { role: 'ring', from: gateTerminal(p.busOut ^ 2), to: gateTerminal(s.inPort), steps: p.ring.slice(0, k) },
              { role: 'ring', from: gateTerminal(s.outPort), to: gateTerminal(p.busIn ^ 2), steps: p.ring.slice(k + 1) },
              { role: 'bus', from: gateTerminal(s.outPort ^ 2), to: portTerminal(mesh, a.drop), steps: dropOut.steps },
            ];
            if (a.add !== undefined) paths.push({ role: 'bus', from: portTerminal(mesh, a.add), to: gateTerminal(s.inPort ^ 2), steps: addIn.steps });
            return {
              paths,
              couplers: [
                { gate: p.coupler, role: 'ring-coupler', kappa: crossKappa(p.busIn, p.busOut, a.kappa), phaseRad: 0 },
                { gate: s.gate, role: 'ring-coupler', kappa: crossKappa(s.inPort, s.outPort, a.dropKappa), phaseRad: 0 },
              ],
            };
          }
        last = dropOut.ok ? (addIn as Exclude<typeof addIn, { ok: true }>) : dropOut;
        space.releaseSplit(s.gate);
      }
      space.use(s.inPort, s.outPort);
    }
  }
  if (r.done && last.message === 'add-drop ring: no placement') last = r.value;
  return routeFailure(last.reason === 'search-limit' ? 'search-limit' : 'not-enough-free-area', `add-drop ring of ${a.perimeterUnits} units: no ring reaches a free drop bus (${last.message})`);
}
