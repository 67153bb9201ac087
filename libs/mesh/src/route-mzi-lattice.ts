/** Places a Mach-Zehnder stage or a lattice of stages: split gates along a bus, each stage's second arm routed beside it. */
import { crossKappa, gateTerminal, portTerminal, type CircuitDraft, type DraftPath } from './circuit-draft.js';
import { legBetween } from './legs.js';
import type { Mesh } from './mesh.js';
import { pathDistances, UNREACHABLE } from './path-distances.js';
import type { ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';
import { shortestWalk, walkOfLength } from './walks.js';

export type MziLatticeArgs = { from: number; to: number; deltasUnits: readonly number[]; kappas: readonly number[]; budget?: number | undefined };

/** Cap on arm searches per request (each itself bounded by the search budget). */
export const MZI_ARM_ATTEMPTS = 600;

/**
 * Stage k has arm 1 along the bus between couplers k and k+1 and arm 2 on the couplers' other
 * waveguides, longer by `deltasUnits[k]` (even, >= 0). Tries the shortest bus, then longer ones.
 */
export function routeMziLattice(mesh: Mesh, space: RouteSpace, a: MziLatticeArgs): CircuitDraft | RouteFailure {
  const n = a.deltasUnits.length;
  if (n < 1) return routeFailure('invalid-request', 'a Mach-Zehnder lattice needs at least one stage');
  for (const d of a.deltasUnits)
    if (!Number.isInteger(d) || d < 0 || d % 2 !== 0)
      return routeFailure('wrong-parity', `arm length difference ${d} must be an even number >= 0; both arms join the same two gates, so on the bipartite hexagonal lattice their lengths differ by an even number`);
  if (a.kappas.length !== n + 1) return routeFailure('invalid-request', `a lattice of ${n} stages needs ${n + 1} coupler kappas, got ${a.kappas.length}`);
  const src = mesh.ports[a.from]!.gatePort;
  const tgt = mesh.ports[a.to]!.gatePort;
  const d0 = pathDistances(space, [tgt])[src]!;
  if (d0 >= UNREACHABLE) return shortestWalk(space, src, [tgt], 'Mach-Zehnder bus') as RouteFailure;
  let attempts = 0;
  for (const extra of [0, 2, 4, 8, 16, 32]) {
    const bus = extra === 0 ? shortestWalk(space, src, [tgt], 'Mach-Zehnder bus') : walkOfLength(space, src, [tgt], d0 + extra, 'Mach-Zehnder bus', a.budget);
    if (!bus.ok) continue;
    const b = bus.steps;
    if (b.length < n + 1) continue;
    space.useAll(b);
    const arms: ResolvedStep[][] = [];
    const at: number[] = [];
    const place = (k: number, i: number): boolean => {
      if (k === n) return true;
      for (let j = i + 1; j < b.length && attempts < MZI_ARM_ATTEMPTS; j++) {
        const s = b[j]!;
        space.release(s.inPort, s.outPort);
        if (space.canSplit(s.gate)) {
          space.claimSplit(s.gate);
          attempts++;
          const arm = legBetween(space, b[i]!.outPort ^ 2, s.inPort ^ 2, j - i - 1 + a.deltasUnits[k]!, 'Mach-Zehnder arm', 4_000);
          if (arm.ok) {
            space.useAll(arm.steps);
            arms.push(arm.steps);
            at.push(j);
            if (place(k + 1, j)) return true;
            at.pop();
            arms.pop();
            space.releaseAll(arm.steps);
          }
          space.releaseSplit(s.gate);
        }
        space.use(s.inPort, s.outPort);
      }
      return false;
    };
    for (let i0 = 0; i0 + n < b.length && attempts < MZI_ARM_ATTEMPTS; i0++) {
      const s = b[i0]!;
      space.release(s.inPort, s.outPort);
      if (space.canSplit(s.gate)) {
        space.claimSplit(s.gate);
        at.push(i0);
        if (place(0, i0)) {
          const paths: DraftPath[] = [{ role: 'bus', from: portTerminal(mesh, a.from), to: gateTerminal(b[i0]!.inPort), steps: b.slice(0, i0) }];
          for (let k = 0; k < n; k++) {
            const i = at[k]!;
            const j = at[k + 1]!;
            paths.push({ role: 'arm', from: gateTerminal(b[i]!.outPort), to: gateTerminal(b[j]!.inPort), steps: b.slice(i + 1, j) });
            paths.push({ role: 'arm', from: gateTerminal(b[i]!.outPort ^ 2), to: gateTerminal(b[j]!.inPort ^ 2), steps: arms[k]! });
          }
          const last = at[n]!;
          paths.push({ role: 'bus', from: gateTerminal(b[last]!.outPort), to: portTerminal(mesh, a.to), steps: b.slice(last + 1) });
          return {
            paths,
            couplers: at.map((i, k) => ({ gate: b[i]!.gate, role: k === 0 ? 'splitter' : 'combiner', kappa: crossKappa(b[i]!.inPort, b[i]!.outPort, a.kappas[k]!), phaseRad: 0 })),
          };
        }
        at.pop();
        space.releaseSplit(s.gate);
      }
      space.use(s.inPort, s.outPort);
    }
    space.releaseAll(b);
  }
  return routeFailure(attempts >= MZI_ARM_ATTEMPTS ? 'search-limit' : 'not-enough-free-area', `Mach-Zehnder ${n > 1 ? `lattice of ${n} stages` : 'stage'} with arm differences ${a.deltasUnits.join(', ')} units: no free arms beside the bus (${attempts} arm searches)`);
}
