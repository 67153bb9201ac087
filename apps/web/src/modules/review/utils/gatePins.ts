// Pins for the mesh canvas: how many comments point at each gate, and whether their threads are all resolved.
import type { Comment } from '@hexloom/contracts';
import { commentThreads } from './commentThreads.js';

/** One gate with comments: the count of comments anchored to it and whether every one of their threads is resolved. */
export type GatePin = { gateId: string; count: number; resolved: boolean };

/** Pins of every gate some comment is anchored to, sorted by gate id (pure; replies count like first comments). */
export function gatePins(comments: readonly Comment[]): GatePin[] {
  const pins = new Map<string, GatePin>();
  for (const thread of commentThreads(comments)) {
    const resolved = thread.root.resolvedAt !== null;
    for (const c of [thread.root, ...thread.replies]) {
      if (!c.anchor || !('gate' in c.anchor)) continue;
      const pin = pins.get(c.anchor.gate) ?? { gateId: c.anchor.gate, count: 0, resolved: true };
      pins.set(c.anchor.gate, { gateId: pin.gateId, count: pin.count + 1, resolved: pin.resolved && resolved });
    }
  }
  return [...pins.values()].sort((a, b) => (a.gateId < b.gateId ? -1 : a.gateId > b.gateId ? 1 : 0));
}
