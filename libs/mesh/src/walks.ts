/** Walk finders shared by every router: shortest free walk, and walk of an exact length. */
import { DEFAULT_SEARCH_BUDGET, findPathExact } from './find-path.js';
import { growPath } from './grow-path.js';
import { pathDistances, UNREACHABLE } from './path-distances.js';
import type { ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import { RouteSpace } from './route-space.js';

export type WalkResult = { readonly ok: true; readonly steps: ResolvedStep[] } | RouteFailure;

/** Explains an unreachable target: blocked only by dead gates, or no free way at all. */
function unreachable(space: RouteSpace, source: number, targets: readonly number[], what: string): RouteFailure {
  const relaxed = new RouteSpace(space.mesh);
  relaxed.state.set(space.state);
  relaxed.channel.set(space.channel);
  relaxed.uses.set(space.uses);
  for (const g of space.mesh.gates) relaxed.allowed[g.index] = space.allowed[g.index] || g.dead ? 1 : 0;
  if (pathDistances(relaxed, targets)[source]! < UNREACHABLE) return routeFailure('dead-gates-in-the-way', `${what}: every free way is blocked by dead gates`);
  return routeFailure('no-free-path', `${what}: no free path (the gates between them are taken or outside the region)`);
}

/** The shortest walk (in units) from `source` to a target that does not conflict with itself. */
export function shortestWalk(space: RouteSpace, source: number, targets: readonly number[], what: string, budget = DEFAULT_SEARCH_BUDGET): WalkResult {
  const dist = pathDistances(space, targets);
  const d = dist[source]!;
  if (d >= UNREACHABLE) return unreachable(space, source, targets, what);
  let exhausted = false;
  for (let L = d; L <= d + 12; L += 2) {
    const r = findPathExact(space, { source, targets, lengthUnits: L, budget, distances: dist });
    if (r.steps) return { ok: true, steps: r.steps };
    exhausted ||= r.exhausted;
  }
  return routeFailure(exhausted ? 'search-limit' : 'no-free-path', `${what}: no walk within ${d + 12} units that avoids itself`);
}

/**
 * A walk of exactly `lengthUnits` units: the shortest walk grown by cell detours, else a bounded
 * depth-first search (budget in search nodes). Parity and area are checked first.
 */
export function walkOfLength(space: RouteSpace, source: number, targets: readonly number[], lengthUnits: number, what: string, budget = DEFAULT_SEARCH_BUDGET): WalkResult {
  const dist = pathDistances(space, targets);
  const d = dist[source]!;
  if (d >= UNREACHABLE) return unreachable(space, source, targets, what);
  if ((lengthUnits - d) % 2 !== 0)
    return routeFailure('wrong-parity', `${what}: ${lengthUnits} units has the wrong parity; the hexagonal lattice is bipartite, so only ${d}, ${d + 2}, ${d + 4}, ... units are possible`);
  if (lengthUnits < d) return routeFailure('too-short', `${what}: ${lengthUnits} units is shorter than the shortest free path, ${d} units`);
  if (lengthUnits > space.freeWaveguides()) return routeFailure('not-enough-free-area', `${what}: ${lengthUnits} units exceeds the ${space.freeWaveguides()} free waveguides`);
  if (lengthUnits - d > 6) {
    const base = shortestWalk(space, source, targets, what, budget);
    if (base.ok) {
      space.useAll(base.steps);
      const grown = growPath(space, base.steps, lengthUnits);
      space.releaseAll(grown ?? base.steps);
      if (grown) return { ok: true, steps: grown };
    }
  }
  const r = findPathExact(space, { source, targets, lengthUnits, budget, distances: dist });
  if (r.steps) return { ok: true, steps: r.steps };
  return r.exhausted
    ? routeFailure('search-limit', `${what}: no ${lengthUnits}-unit path found within the search limit of ${budget} nodes`)
    : routeFailure('not-enough-free-area', `${what}: no free path of exactly ${lengthUnits} units exists (shortest is ${d})`);
}
