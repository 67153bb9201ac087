/** Places a 1xN splitter tree (a trunk with split gates feeding branches) with an exact delay to every output. */
import { gateTerminal, portTerminal, type CircuitDraft, type DraftPath } from './circuit-draft.js';
import type { Mesh } from './mesh.js';
import { linksOn } from './legs.js';
import { stepStateAndChannel, type ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';
import { walkOfLength } from './walks.js';

export type SplitterTreeArgs = { from: number; outputs: readonly { port: number; delayUnits: number }[]; budget?: number | undefined };

/** Cap on branch searches per request. */
export const TREE_BRANCH_ATTEMPTS = 800;

/**
 * The trunk runs to the last output; each other output branches off at a split gate on the trunk,
 * in the order given. Delays count every gate from the input, split gates included. Split ratios
 * give every output the same power (ideal, lossless): the k-th split from the input sends 1/(N-k) to its branch.
 */
export function routeSplitterTree(mesh: Mesh, space: RouteSpace, a: SplitterTreeArgs): CircuitDraft | RouteFailure {
  const N = a.outputs.length;
  if (N < 2) return routeFailure('invalid-request', 'a splitter tree needs at least two outputs');
  for (const o of a.outputs) if (!Number.isInteger(o.delayUnits) || o.delayUnits < 1) return routeFailure('invalid-request', `branch delay ${o.delayUnits} must be a whole number of units >= 1`);
  // The trunk runs to the last output; the others branch off in the order given, each further along
  // the trunk than the one before, so branches listed in the order their ports sit on the chip edge never cross.
  const order = [a.outputs[N - 1]!, ...a.outputs.slice(0, N - 1)];
  const trunkOut = order[0]!;
  const src = mesh.ports[a.from]!.gatePort;
  const trunk = walkOfLength(space, src, [mesh.ports[trunkOut.port]!.gatePort], trunkOut.delayUnits, `trunk to ${mesh.ports[trunkOut.port]!.id}`, a.budget);
  if (!trunk.ok) return trunk;
  const t = trunk.steps;
  space.useAll(t);
  const taken = new Map<number, { port: number; steps: ResolvedStep[] }>();
  let attempts = 0;
  let last: RouteFailure | undefined;
  const place = (k: number, after: number): boolean => {
    if (k === order.length) return true;
    const o = order[k]!;
    const tgt = mesh.ports[o.port]!.gatePort;
    for (let i = after + 1; i < t.length && attempts < TREE_BRANCH_ATTEMPTS; i++) {
      const need = o.delayUnits - (i + 1);
      if (need < 0 || taken.has(i)) continue;
      const s = t[i]!;
      const branchOut = s.outPort ^ 2;
      if (need === 0 ? branchOut !== tgt : !linksOn(space, branchOut)) continue;
      space.release(s.inPort, s.outPort);
      if (space.canSplit(s.gate)) {
        space.claimSplit(s.gate);
        attempts++;
        const br = need === 0 ? { ok: true as const, steps: [] } : walkOfLength(space, mesh.link[branchOut]!, [tgt], need, `branch to ${mesh.ports[o.port]!.id}`, 4_000);
        if (br.ok) {
          space.useAll(br.steps);
          taken.set(i, { port: o.port, steps: br.steps });
          if (place(k + 1, i)) return true;
          taken.delete(i);
          space.releaseAll(br.steps);
        } else last = br;
        space.releaseSplit(s.gate);
      }
      space.use(s.inPort, s.outPort);
    }
    return false;
  };
  if (!place(1, -1)) {
    space.releaseAll(t);
    return routeFailure(attempts >= TREE_BRANCH_ATTEMPTS ? 'search-limit' : 'not-enough-free-area', `splitter tree: the branches cannot all get their delays off the trunk${last ? ` (${last.message})` : ''}`);
  }
  const at = [...taken.keys()].sort((x, y) => x - y);
  const paths: DraftPath[] = [];
  let prev: number | undefined;
  for (const i of at) {
    paths.push({ role: 'bus', from: prev === undefined ? portTerminal(mesh, a.from) : gateTerminal(t[prev]!.outPort), to: gateTerminal(t[i]!.inPort), steps: t.slice(prev === undefined ? 0 : prev + 1, i) });
    const b = taken.get(i)!;
    paths.push({ role: 'branch', from: gateTerminal(t[i]!.outPort ^ 2), to: portTerminal(mesh, b.port), steps: b.steps });
    prev = i;
  }
  paths.push({ role: 'bus', from: gateTerminal(t[prev!]!.outPort), to: portTerminal(mesh, trunkOut.port), steps: t.slice(prev! + 1) });
  const couplers = at.map((i, k) => {
    const fraction = 1 / (N - k);
    const bar = stepStateAndChannel(t[i]!.inPort, t[i]!.outPort).state === 0;
    return { gate: t[i]!.gate, role: 'splitter' as const, kappa: bar ? fraction : 1 - fraction, phaseRad: 0 };
  });
  return { paths, couplers };
}
