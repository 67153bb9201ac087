/** Bounded depth-first search for a walk of an exact number of units, pruned by distance bounds. */
import type { ResolvedStep } from './resolve-circuit.js';
import type { RouteSpace } from './route-space.js';
import { pathDistances, UNREACHABLE } from './path-distances.js';

/** Default cap on search nodes per exact-length search; past it the search stops and says so. */
export const DEFAULT_SEARCH_BUDGET = 200_000;

export type FindPathOutcome = { readonly steps: ResolvedStep[] } | { readonly steps: null; readonly exhausted: boolean };

/**
 * A walk of exactly `lengthUnits` traversals that enters at gate port `source` and leaves at a
 * gate port of `targets`, using only what `space` allows and never conflicting with itself.
 * Explores at most `budget` nodes; `exhausted` tells a budget stop from a proof that none exists.
 * The space is left unchanged.
 */
export function findPathExact(space: RouteSpace, args: { source: number; targets: readonly number[]; lengthUnits: number; budget?: number; distances?: Int32Array }): FindPathOutcome {
  const mesh = space.mesh;
  const dist = args.distances ?? pathDistances(space, args.targets);
  const targets = new Set(args.targets);
  const budget = args.budget ?? DEFAULT_SEARCH_BUDGET;
  const L = args.lengthUnits;
  if (L < 1 || dist[args.source]! > L || (dist[args.source]! - L) % 2 !== 0) return { steps: null, exhausted: false };
  const stack: ResolvedStep[] = [];
  let nodes = 0;
  let stopped = false;
  const visit = (inPort: number, remaining: number): boolean => {
    if (++nodes > budget) {
      stopped = true;
      return false;
    }
    const g = inPort >> 2;
    const base = (g << 2) | ((inPort & 1) ^ 1);
    const a = base;
    const b = base | 2;
    // Prefer the exit whose continuation is nearer the target; detours come from backtracking.
    const order = remaining > 1 && dist[mesh.link[b]!] !== undefined && dist[mesh.link[b]!]! < (dist[mesh.link[a]!] ?? UNREACHABLE) ? [b, a] : [a, b];
    for (const out of order) {
      if (!space.canUse(inPort, out)) continue;
      if (remaining === 1) {
        if (targets.has(out)) {
          stack.push({ gate: g, inPort, outPort: out });
          return true;
        }
        continue;
      }
      const kind = mesh.linkKind[out];
      if (kind !== 'corner' && kind !== 'bend') continue;
      const next = mesh.link[out]!;
      if (dist[next]! > remaining - 1) continue;
      space.use(inPort, out);
      stack.push({ gate: g, inPort, outPort: out });
      if (visit(next, remaining - 1)) {
        space.release(inPort, out);
        return true;
      }
      stack.pop();
      space.release(inPort, out);
      if (stopped) return false;
    }
    return false;
  };
  const found = visit(args.source, L);
  if (found) {
    // `visit` released its marks on the way out; the steps are in order.
    return { steps: stack };
  }
  return { steps: null, exhausted: stopped };
}
