// Exhaustive enumeration of every self-consistent walk on a small mesh, written from the lattice
// rules alone (independent of the router): it walks the mesh's link tables step by step.
import type { Mesh } from '../src/index.js';

export type WalkRecord = { from: number; to: number; lengthUnits: number; lossDb: number };

/** Channel (side at end 0) and state (0 bar, 1 cross) of entering at inPort and leaving at outPort. */
const traversal = (inPort: number, outPort: number) => {
  const sIn = (inPort >> 1) & 1;
  const sOut = (outPort >> 1) & 1;
  return { channel: (inPort & 1) === 0 ? sIn : sOut, state: sIn === sOut ? 0 : 1 };
};

type Visitor = (inPort: number, outPort: number, depth: number, lossDb: number) => boolean;

function walk(mesh: Mesh, start: number, maxDepth: number, visit: Visitor): void {
  const usedChannel = new Uint8Array(mesh.gates.length * 2);
  const state = new Int8Array(mesh.gates.length).fill(-1);
  const uses = new Uint8Array(mesh.gates.length);
  const bend = mesh.definition.technology.bendLossDb;
  const go = (inPort: number, depth: number, lossDb: number) => {
    const g = inPort >> 2;
    if (mesh.gates[g]!.dead) return;
    for (let side = 0; side < 2; side++) {
      const outPort = (g << 2) | (side << 1) | ((inPort & 1) ^ 1);
      const t = traversal(inPort, outPort);
      if (usedChannel[g * 2 + t.channel] || (state[g] !== -1 && state[g] !== t.state)) continue;
      const loss = lossDb + mesh.gates[g]!.lossDb;
      if (!visit(inPort, outPort, depth + 1, loss) || depth + 1 >= maxDepth) continue;
      const kind = mesh.linkKind[outPort];
      if (kind !== 'corner' && kind !== 'bend') continue;
      usedChannel[g * 2 + t.channel] = 1;
      uses[g]! += 1;
      const before = state[g]!;
      state[g] = t.state;
      go(mesh.link[outPort]!, depth + 1, loss + (kind === 'bend' ? bend : 0));
      usedChannel[g * 2 + t.channel] = 0;
      uses[g]! -= 1;
      state[g] = uses[g] === 0 ? -1 : before;
    }
  };
  go(start, 0, 0);
}

/** Every (port, port, length) of a self-consistent walk between two external ports, with the least loss seen for each. */
export function enumeratePortWalks(mesh: Mesh, maxDepth = 200): WalkRecord[] {
  const best = new Map<string, WalkRecord>();
  for (const a of mesh.ports)
    walk(mesh, a.gatePort, maxDepth, (_in, out, depth, lossDb) => {
      const b = mesh.portAt[out]!;
      if (b >= 0) {
        const key = `${a.index}>${b}>${depth}`;
        const prev = best.get(key);
        if (!prev || lossDb < prev.lossDb) best.set(key, { from: a.index, to: b, lengthUnits: depth, lossDb });
      }
      return true;
    });
  return [...best.values()];
}

/** Every loop length: walks that leave at the gate port whose link feeds their own start. */
export function enumerateLoopLengths(mesh: Mesh, maxDepth = 200): Set<number> {
  const lengths = new Set<number>();
  for (let start = 0; start < mesh.link.length; start++) {
    const kind = mesh.linkKind[start];
    if (kind !== 'corner' && kind !== 'bend') continue;
    const closing = mesh.link[start]!;
    walk(mesh, start, maxDepth, (_in, out, depth) => {
      if (out === closing) lengths.add(depth);
      return true;
    });
  }
  return lengths;
}
