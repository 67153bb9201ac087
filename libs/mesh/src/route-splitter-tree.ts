/** Places a 1xN splitter tree (a trunk with split gates feeding branches) with an exact delay to every output. */
import { gateTerminal, portTerminal, type CircuitDraft, type DraftPath } from './circuit-draft.js';
import type { Mesh } from './mesh.js';
import { linksOn } from './legs.js';
import { stepStateAndChannel, type ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';
import { shortestWalk, walkOfLength } from './walks.js';

export type SplitterTreeArgs = { from: number; outputs: readonly { port: number; delayUnits: number }[]; budget?: number | undefined };

/** Cap on branch searches per request. */
export const TREE_BRANCH_ATTEMPTS = 800;

type Output = { port: number; delayUnits: number };

/**
 * A comb: a trunk from the input to one output, the others branching off at split gates on it in the order given.
 * The trunk starts as the shortest free walk; each branch leaves at a trunk gate where an exact-length walk of the
 * rest of its delay fits, then the trunk's tail after the last split is redrawn to the trunk output's exact delay.
 * Delays count every gate from the input, split gates included. Both ways round are tried: trunk to the last
 * output (branches in the order given) and trunk to the first (branches in reverse order), so branches to ports
 * listed in their order along the chip edge never cross.
 */
function combOf(mesh: Mesh, space: RouteSpace, a: SplitterTreeArgs, order: readonly Output[], polite: boolean): CircuitDraft | RouteFailure {
  const trunkOut = order[0]!;
  const src = mesh.ports[a.from]!.gatePort;
  const trunkTarget = mesh.ports[trunkOut.port]!.gatePort;
  // Politely, every walk keeps off the gates of the outputs it does not lead to, so no walk closes another output
  // off; where an output can only be reached through another one's gate, the second attempt allows it.
  const portGate = (o: Output) => mesh.ports[o.port]!.gatePort >> 2;
  const saved = new Map(order.map((o) => [portGate(o), space.allowed[portGate(o)]!]));
  const reserve = (except: Output | null) => {
    if (!polite) return;
    for (const g of saved.keys()) space.allowed[g] = 0;
    for (const o of order) if (o === except || o === trunkOut) space.allowed[portGate(o)] = saved.get(portGate(o))!;
  };
  const restore = () => {
    for (const [g, v] of saved) space.allowed[g] = v;
  };
  reserve(null);
  try {
    return grow(mesh, space, a, order, reserve);
  } finally {
    restore();
  }
}

/** The comb itself, with `reserve(o)` opening output o's port gate (null: only the trunk output's). */
function grow(mesh: Mesh, space: RouteSpace, a: SplitterTreeArgs, order: readonly Output[], reserve: (except: Output | null) => void): CircuitDraft | RouteFailure {
  const trunkOut = order[0]!;
  const src = mesh.ports[a.from]!.gatePort;
  const trunkTarget = mesh.ports[trunkOut.port]!.gatePort;
  const trunk = shortestWalk(space, src, [trunkTarget], `trunk to ${mesh.ports[trunkOut.port]!.id}`);
  if (!trunk.ok) return trunk;
  const t = trunk.steps;
  if (t.length > trunkOut.delayUnits) return routeFailure('too-short', `splitter tree: ${trunkOut.delayUnits} units to ${mesh.ports[trunkOut.port]!.id} is shorter than the shortest free path, ${t.length} units`);
  space.useAll(t);
  const taken = new Map<number, { port: number; steps: ResolvedStep[] }>();
  let tail: ResolvedStep[] = [];
  let attempts = 0;
  let last: RouteFailure | undefined;
  // After the last split at trunk index i, the tail t[i+1..] is redrawn to the trunk output's exact delay.
  const finish = (i: number): boolean => {
    const need = trunkOut.delayUnits - (i + 1);
    const old = t.slice(i + 1);
    space.releaseAll(old);
    const out = t[i]!.outPort;
    const r = need === 0 ? (out === trunkTarget ? { ok: true as const, steps: [] } : routeFailure('no-free-path', 'trunk tail')) : linksOn(space, out) ? walkOfLength(space, mesh.link[out]!, [trunkTarget], need, `trunk to ${mesh.ports[trunkOut.port]!.id}`, BRANCH_BUDGET) : routeFailure('no-free-path', 'trunk tail');
    if (r.ok) {
      space.useAll(r.steps);
      tail = r.steps;
      return true;
    }
    last = r;
    space.useAll(old);
    return false;
  };
  const place = (k: number, after: number): boolean => {
    if (k === order.length) return finish(after);
    const o = order[k]!;
    const tgt = mesh.ports[o.port]!.gatePort;
    for (let i = after + 1; i < t.length && attempts < TREE_BRANCH_ATTEMPTS; i++) {
      const need = o.delayUnits - (i + 1);
      if (need < 0) break;
      const s = t[i]!;
      const branchOut = s.outPort ^ 2;
      if (need === 0 ? branchOut !== tgt : !linksOn(space, branchOut)) continue;
      space.release(s.inPort, s.outPort);
      if (space.canSplit(s.gate)) {
        space.claimSplit(s.gate);
        attempts++;
        reserve(o);
        const br = need === 0 ? { ok: true as const, steps: [] } : walkOfLength(space, mesh.link[branchOut]!, [tgt], need, `branch to ${mesh.ports[o.port]!.id}`, BRANCH_BUDGET);
        if (br.ok) {
          space.useAll(br.steps);
          taken.set(i, { port: o.port, steps: br.steps });
          reserve(null);
          if (place(k + 1, i)) return true;
          taken.delete(i);
          space.releaseAll(br.steps);
        } else last = br;
        reserve(null);
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
  paths.push({ role: 'bus', from: gateTerminal(t[prev!]!.outPort), to: portTerminal(mesh, trunkOut.port), steps: tail });
  const N = order.length;
  const couplers = at.map((i, k) => {
    const fraction = 1 / (N - k);
    const bar = stepStateAndChannel(t[i]!.inPort, t[i]!.outPort).state === 0;
    return { gate: t[i]!.gate, role: 'splitter' as const, kappa: bar ? fraction : 1 - fraction, phaseRad: 0 };
  });
  return { paths, couplers };
}

/** Search-node cap of each branch's exact-length walk. */
const BRANCH_BUDGET = 20_000;

/**
 * A 1xN splitter tree with an exact delay to every output. Split ratios give every output the same power on a
 * lossless chip (the k-th split from the input sends 1/(N-k) to its branch); the synthesiser rebalances them for loss.
 */
export function routeSplitterTree(mesh: Mesh, space: RouteSpace, a: SplitterTreeArgs): CircuitDraft | RouteFailure {
  const N = a.outputs.length;
  if (N < 2) return routeFailure('invalid-request', 'a splitter tree needs at least two outputs');
  for (const o of a.outputs) if (!Number.isInteger(o.delayUnits) || o.delayUnits < 1) return routeFailure('invalid-request', `branch delay ${o.delayUnits} must be a whole number of units >= 1`);
  const orders = [
    [a.outputs[N - 1]!, ...a.outputs.slice(0, N - 1)],
    [a.outputs[0]!, ...a.outputs.slice(1).reverse()],
  ];
  let failure: RouteFailure | undefined;
  for (const polite of [true, false])
    for (const order of orders) {
      const r = combOf(mesh, space, a, order, polite);
      if ('paths' in r) return r;
      failure = failure ?? r;
    }
  return failure!;
}
