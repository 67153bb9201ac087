// Helpers for tests of circuits placed by the libs/mesh router: the phase of a routed loop from the compiled gates.
import type { Circuit, CircuitPath, Mesh } from '@hexloom/mesh';
import type { MeshNetlist } from '../src/index.js';

/** Transfer element (out side, in side) of one traversal of a gate, direction from the end of `in`. */
function element(chip: MeshNetlist, mesh: Mesh, gate: string, inLabel: string, outLabel: string): [number, number] {
  const g = mesh.gateIndex.get(gate);
  if (g === undefined) throw new Error(`unknown gate ${gate}`);
  const t = chip.network.gates[g]!.transfer;
  const inSide = inLabel[0] === 'a' ? 0 : 1, outSide = outLabel[0] === 'a' ? 0 : 1;
  // Forward (enter at end 0) uses t[out][in]; reverse (enter at end 1) the transpose t[in][out].
  const [row, col] = inLabel[1] === '0' ? [outSide, inSide] : [inSide, outSide];
  const k = 4 * row + 2 * col;
  return [t[k]!, t[k + 1]!];
}

const mul = (a: [number, number], b: [number, number]): [number, number] => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];

/** Product of the transfer elements along a path's steps. */
export function pathProduct(chip: MeshNetlist, mesh: Mesh, path: CircuitPath): [number, number] {
  return path.steps.reduce<[number, number]>((acc, s) => mul(acc, element(chip, mesh, s.gate, s.in, s.out)), [1, 0]);
}

/** Round-trip phase psi (radians) of the ring of a routed all-pass circuit, including its coupler's ring-side element. */
export function ringRoundTrip(chip: MeshNetlist, mesh: Mesh, circuit: Circuit): { psiRad: number; ringSelf: [number, number]; busThrough: [number, number] } {
  const ring = circuit.paths.find((p) => p.role === 'ring');
  const coupler = circuit.couplers[0];
  if (!ring || !coupler || !('gate' in ring.to) || !('gate' in ring.from)) throw new Error('not a routed ring');
  const buses = circuit.paths.filter((p) => p.role === 'bus');
  const busIn = buses.find((p) => 'gate' in p.to)!, busOut = buses.find((p) => 'gate' in p.from)!;
  const self = element(chip, mesh, coupler.gate, ring.to.at, ring.from.at);
  const loop = mul(self, pathProduct(chip, mesh, ring));
  const through = element(chip, mesh, coupler.gate, (busIn.to as { at: string }).at, (busOut.from as { at: string }).at);
  return { psiRad: Math.atan2(loop[1], loop[0]), ringSelf: self, busThrough: through };
}
