/** Finds the closed loops (rings) of a placed circuit: ring paths joined through their couplers' bar ports. */
import type { Circuit, CircuitPath, GatePortLabel, PathStep } from '@hexloom/mesh';
import { barExit, crossExit } from './gate-element.js';

/** One traversal of a loop: a path step, or the pass through a coupler on its own waveguide. */
export type LoopTraversal = { gate: string; in: GatePortLabel; out: GatePortLabel; coupler: boolean };

export type CircuitLoop = { traversals: LoopTraversal[]; lengthUnits: number };

/** True when the loop passes this coupler on one waveguide (its self-coupling is the gate's bar path). */
export const passesStraight = (t: LoopTraversal): boolean => t.in[0] === t.out[0];

const key = (gate: string, at: GatePortLabel): string => `${gate}:${at}`;

/**
 * Every loop of ring paths: a ring path ends at a coupler input port, light passes the coupler on the same
 * waveguide (bar side of the split gate) and continues in the ring path that starts at that bar exit.
 * Each unit of length is one gate traversal, so the loop length counts path steps plus coupler passes.
 */
export function circuitLoops(circuit: Circuit): CircuitLoop[] {
  const ringPaths = circuit.paths.filter((p): p is CircuitPath & { from: { gate: string; at: GatePortLabel }; to: { gate: string; at: GatePortLabel } } => p.role === 'ring' && 'gate' in p.from && 'gate' in p.to);
  const startingAt = new Map(ringPaths.map((p) => [key(p.from.gate, p.from.at), p]));
  const seen = new Set<CircuitPath>();
  const loops: CircuitLoop[] = [];
  for (const first of ringPaths) {
    if (seen.has(first)) continue;
    const traversals: LoopTraversal[] = [];
    let path: (typeof ringPaths)[number] | undefined = first;
    while (path && !seen.has(path)) {
      seen.add(path);
      traversals.push(...path.steps.map((s: PathStep) => ({ gate: s.gate, in: s.in, out: s.out, coupler: false })));
      // The ring leaves its coupler at the other end, on the same waveguide (bar) or, where the router drew
      // the loop across the gate, on the other one (cross).
      const bar = barExit(path.to.at);
      const cross = crossExit(path.to.at);
      const next: (typeof ringPaths)[number] | undefined = startingAt.get(key(path.to.gate, bar)) ?? startingAt.get(key(path.to.gate, cross));
      const exit = next && next.from.at === cross ? cross : bar;
      traversals.push({ gate: path.to.gate, in: path.to.at, out: exit, coupler: true });
      path = next;
    }
    if (path === first) loops.push({ traversals, lengthUnits: traversals.length });
  }
  return loops;
}
