/** Walks between a terminal and a coupler port: into a split gate's input, out of its output, or between two. */
import type { ResolvedStep } from './resolve-circuit.js';
import { routeFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';
import { shortestWalk, walkOfLength, type WalkResult } from './walks.js';

/** Whether light leaving at gate port p continues into another gate (corner link or bend). */
export function linksOn(space: RouteSpace, p: number): boolean {
  const k = space.mesh.linkKind[p];
  return k === 'corner' || k === 'bend';
}

/** Shortest walk entering at `sourceIn` that ends by feeding input port `couplerIn` of a split gate (empty when they coincide). */
export function legInto(space: RouteSpace, sourceIn: number, couplerIn: number, what: string): WalkResult {
  if (sourceIn === couplerIn) return { ok: true, steps: [] };
  if (!linksOn(space, couplerIn)) return routeFailure('no-free-path', `${what}: the coupler input has no corner link`);
  return shortestWalk(space, sourceIn, [space.mesh.link[couplerIn]!], what);
}

/** Shortest walk from output port `couplerOut` of a split gate to leaving at `targetOut` (empty when they coincide). */
export function legOutOf(space: RouteSpace, couplerOut: number, targetOut: number, what: string): WalkResult {
  if (couplerOut === targetOut) return { ok: true, steps: [] };
  if (!linksOn(space, couplerOut)) return routeFailure('no-free-path', `${what}: the coupler output has no corner link`);
  return shortestWalk(space, space.mesh.link[couplerOut]!, [targetOut], what);
}

/** A walk of exactly `lengthUnits` steps from split-gate output `fromOut` to split-gate input `toIn`. */
export function legBetween(space: RouteSpace, fromOut: number, toIn: number, lengthUnits: number, what: string, budget?: number): WalkResult {
  if (lengthUnits === 0) return space.mesh.link[fromOut] === toIn && linksOn(space, fromOut) ? { ok: true, steps: [] } : routeFailure('no-free-path', `${what}: ports not adjacent`);
  if (!linksOn(space, fromOut) || !linksOn(space, toIn)) return routeFailure('no-free-path', `${what}: the coupler ports have no corner link`);
  return walkOfLength(space, space.mesh.link[fromOut]!, [space.mesh.link[toIn]!], lengthUnits, what, budget);
}

/** Marks steps used and returns them (for chaining). */
export function take(space: RouteSpace, steps: ResolvedStep[]): ResolvedStep[] {
  space.useAll(steps);
  return steps;
}
