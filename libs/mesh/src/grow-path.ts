/** Lengthens a walk to an exact length by local detours around cells (+2 or +4 units per move). */
import { cellFrame } from './cell-frame.js';
import type { ResolvedStep } from './resolve-circuit.js';
import type { RouteSpace } from './route-space.js';

/**
 * Re-derives steps for a gate sequence: the first step keeps its entry port, each next gate is
 * entered through the corner link or bend the previous exit leads to; the last step must end at
 * `lastOut`. Returns null when some transition has no link.
 */
function chain(space: RouteSpace, firstIn: number, gates: readonly number[], lastOut: number): ResolvedStep[] | null {
  const mesh = space.mesh;
  const steps: ResolvedStep[] = [];
  let inPort = firstIn;
  for (let k = 0; k < gates.length; k++) {
    const g = gates[k]!;
    if (inPort >> 2 !== g) return null;
    if (k === gates.length - 1) {
      if (lastOut >> 2 !== g || (lastOut & 1) === (inPort & 1)) return null;
      steps.push({ gate: g, inPort, outPort: lastOut });
      break;
    }
    const next = gates[k + 1]!;
    const otherEnd = (inPort & 1) ^ 1;
    let chosen = -1;
    for (let side = 0; side < 2; side++) {
      const out = (g << 2) | (side << 1) | otherEnd;
      const kind = mesh.linkKind[out];
      if ((kind === 'corner' || kind === 'bend') && mesh.link[out]! >> 2 === next) chosen = out;
    }
    if (chosen < 0) return null;
    steps.push({ gate: g, inPort, outPort: chosen });
    inPort = mesh.link[chosen]!;
  }
  return steps;
}

function tryReplace(space: RouteSpace, path: ResolvedStep[], i: number, w: number, replacement: ResolvedStep[]): boolean {
  const old = path.slice(i - 1, i + w + 1);
  space.releaseAll(old);
  const used: ResolvedStep[] = [];
  for (const s of replacement) {
    if (!space.canUse(s.inPort, s.outPort)) {
      space.releaseAll(used);
      space.useAll(old);
      return false;
    }
    space.use(s.inPort, s.outPort);
    used.push(s);
  }
  path.splice(i - 1, w + 2, ...replacement);
  return true;
}

/**
 * Grows `steps` (whose traversals must already be marked used in `space`) to `lengthUnits` by
 * replacing one or two steps along a cell by the rest of that cell's boundary. Returns the grown
 * walk (still marked in the space) or null (the space then holds the walk as it was given).
 */
export function growPath(space: RouteSpace, steps: readonly ResolvedStep[], lengthUnits: number, maxMoves = 100_000): ResolvedStep[] | null {
  const frame = cellFrame(space.mesh);
  const mesh = space.mesh;
  const path = [...steps];
  let cursor = 0;
  let moves = 0;
  while (path.length < lengthUnits && moves++ < maxMoves) {
    const need = lengthUnits - path.length;
    let grown = false;
    for (const w of need >= 4 ? [1, 2] : [2]) {
      const n = path.length;
      for (let t = 0; t < n && !grown; t++) {
        const i = 1 + ((cursor + t) % Math.max(1, n - 1 - w));
        if (i + w > n - 1) continue;
        const first = path[i]!;
        const startVertex = mesh.gates[first.gate]!.ends[first.inPort & 1]!;
        const cells = w === 2 ? [mesh.gates[first.gate]!.sideCells[(first.outPort >> 1) & 1]!] : [...mesh.gates[first.gate]!.sideCells];
        for (const c of cells) {
          if (c < 0 || grown) continue;
          const j = [0, 1, 2, 3, 4, 5].find((k) => frame.gates[c * 6 + k] === first.gate);
          if (j === undefined) continue;
          const delta = frame.corners[c * 6 + ((j + 5) % 6)] === startVertex ? 1 : -1;
          if (w === 2 && frame.gates[c * 6 + ((j + delta + 6) % 6)] !== path[i + 1]!.gate) continue;
          const detour: number[] = [];
          for (let k = 1; k <= 6 - w; k++) detour.push(frame.gates[c * 6 + ((((j - k * delta) % 6) + 6) % 6)]!);
          const prev = path[i - 1]!;
          const after = path[i + w]!;
          const replacement = chain(space, prev.inPort, [prev.gate, ...detour, after.gate], after.outPort);
          if (replacement && tryReplace(space, path, i, w, replacement)) {
            grown = true;
            cursor = i + 6 - w + 1;
          }
        }
      }
      if (grown) break;
    }
    if (!grown) break;
  }
  if (path.length === lengthUnits) return path;
  space.releaseAll(path);
  space.useAll(steps);
  return null;
}
