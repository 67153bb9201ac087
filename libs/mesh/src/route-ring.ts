/** Places an all-pass ring (a closed loop of a given perimeter) coupled at a split gate to a bus path. */
import { legBetween, legInto, legOutOf, linksOn } from './legs.js';
import { pathDistances, UNREACHABLE } from './path-distances.js';
import type { ResolvedStep } from './resolve-circuit.js';
import { routeFailure, type RouteFailure } from './route-failure.js';
import type { RouteSpace } from './route-space.js';

/** A placed ring: the split gate, the bus legs into and out of it, and the ring walk (perimeter - 1 steps). */
export type RingPlacement = {
  readonly coupler: number;
  readonly busIn: number;
  readonly busOut: number;
  readonly legIn: readonly ResolvedStep[];
  readonly legOut: readonly ResolvedStep[];
  readonly ring: readonly ResolvedStep[];
};

/**
 * Checks a ring perimeter: loops on the hexagonal lattice are even and at least one cell (6 units), and none has
 * 8 units (one cell is 6, the next loop up, two cells, is 10; perimeters 6n - 2s of cell patches, common practice).
 */
export function checkPerimeter(perimeterUnits: number): RouteFailure | undefined {
  if (!Number.isInteger(perimeterUnits) || perimeterUnits % 2 !== 0)
    return routeFailure('wrong-parity', `ring perimeter ${perimeterUnits} is not even; every closed loop on the hexagonal lattice is even (6, 10, 12, 14, ...)`);
  if (perimeterUnits < 6) return routeFailure('too-short', `ring perimeter ${perimeterUnits} is below 6 units, the loop around one cell`);
  if (perimeterUnits === 8) return routeFailure('invalid-request', 'no loop of 8 units exists on the hexagonal lattice: one cell is 6 units, two neighbouring cells 10 (6, 10, 12, 14, ...)');
  return undefined;
}

/**
 * Yields ring placements between bus source `sourceIn` (light entering there) and bus target
 * `targetOut`, best first (shortest bus through the coupler). While a placement is yielded its
 * gates are marked in the space; resuming the generator frees them and tries the next.
 * Candidates are coupler gates ranked by bus length (plus `bias`, a distance per gate port that
 * pulls the ring towards a second bus), at most `maxCandidates` tried.
 */
export function* ringPlacements(
  space: RouteSpace,
  args: { sourceIn: number; targetOut: number; perimeterUnits: number; budget?: number | undefined; maxCandidates?: number; bias?: Int32Array },
): Generator<RingPlacement, RouteFailure, undefined> {
  const mesh = space.mesh;
  const dIn = pathDistances(space, [args.sourceIn]);
  const dOut = pathDistances(space, [args.targetOut]);
  const candidates: { score: number; g: number; busIn: number; busOut: number }[] = [];
  for (let g = 0; g < mesh.gates.length; g++) {
    if (!space.canSplit(g)) continue;
    for (let k = 0; k < 4; k++) {
      const busIn = (g << 2) | k;
      const c1 = busIn === args.sourceIn ? 0 : linksOn(space, busIn) ? dIn[mesh.link[busIn]!]! : UNREACHABLE;
      if (c1 >= UNREACHABLE) continue;
      for (let side = 0; side < 2; side++) {
        const busOut = (g << 2) | (side << 1) | ((busIn & 1) ^ 1);
        const c2 = busOut === args.targetOut ? 0 : linksOn(space, busOut) ? dOut[mesh.link[busOut]!]! : UNREACHABLE;
        if (c2 >= UNREACHABLE || !linksOn(space, busIn ^ 2) || !linksOn(space, busOut ^ 2)) continue;
        const extra = args.bias ? Math.min(...[0, 1, 2, 3].map((k) => args.bias![(g << 2) | k]!)) : 0;
        candidates.push({ score: c1 + c2 + Math.min(extra, 4 * mesh.cells.length), g, busIn, busOut });
      }
    }
  }
  candidates.sort((x, y) => x.score - y.score);
  let lastFailure: RouteFailure = routeFailure('no-free-path', 'ring: no free gate can couple a ring to a bus between these ports');
  const limit = Math.min(candidates.length, args.maxCandidates ?? 600);
  for (let i = 0; i < limit; i++) {
    const c = candidates[i]!;
    space.claimSplit(c.g);
    const ring = legBetween(space, c.busOut ^ 2, c.busIn ^ 2, args.perimeterUnits - 1, 'ring', args.budget ?? 20_000);
    if (ring.ok) {
      space.useAll(ring.steps);
      const legIn = legInto(space, args.sourceIn, c.busIn, 'bus into the ring coupler');
      if (legIn.ok) {
        space.useAll(legIn.steps);
        const legOut = legOutOf(space, c.busOut, args.targetOut, 'bus out of the ring coupler');
        if (legOut.ok) {
          space.useAll(legOut.steps);
          yield { coupler: c.g, busIn: c.busIn, busOut: c.busOut, legIn: legIn.steps, legOut: legOut.steps, ring: ring.steps };
          space.releaseAll(legOut.steps);
        } else lastFailure = legOut;
        space.releaseAll(legIn.steps);
      } else lastFailure = legIn;
      space.releaseAll(ring.steps);
    } else lastFailure = ring;
    space.releaseSplit(c.g);
  }
  return routeFailure(lastFailure.reason === 'search-limit' ? 'search-limit' : 'not-enough-free-area', `ring of ${args.perimeterUnits} units: no placement found among ${limit} candidate couplers (last: ${lastFailure.message})`);
}
