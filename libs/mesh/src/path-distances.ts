/** Breadth-first lower bounds: fewest gate traversals from entering at a gate port to leaving at a target. */
import type { RouteSpace } from './route-space.js';

/** Distance value of an unreachable gate port. */
export const UNREACHABLE = 0x3fffffff;

/**
 * For every gate port p (light entering there), the fewest traversals, through gates the space
 * allows, until light leaves at one of `targets` (gate ports, light leaving there). Ignores the
 * conflicts a walk may have with itself, so it is a lower bound for the exact-length search.
 */
export function pathDistances(space: RouteSpace, targets: readonly number[]): Int32Array {
  const mesh = space.mesh;
  const dist = new Int32Array(mesh.link.length).fill(UNREACHABLE);
  let frontier: number[] = [];
  const reach = (out: number, d: number) => {
    // The two gate ports at the other end of the same gate that can lead to `out`.
    const g = out >> 2;
    const otherEnd = (out & 1) ^ 1;
    for (let side = 0; side < 2; side++) {
      const inPort = (g << 2) | (side << 1) | otherEnd;
      if (dist[inPort]! <= d || !space.canUse(inPort, out)) continue;
      dist[inPort] = d;
      frontier.push(inPort);
    }
  };
  for (const t of targets) reach(t, 1);
  let d = 1;
  while (frontier.length > 0) {
    const current = frontier;
    frontier = [];
    d += 1;
    for (const p of current) {
      const kind = mesh.linkKind[p];
      if (kind !== 'corner' && kind !== 'bend') continue;
      reach(mesh.link[p]!, d);
    }
  }
  return dist;
}
