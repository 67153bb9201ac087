/** What the circuits of a configuration need of every gate they use, merged, with the gates where they disagree. */
import type { Circuit } from './configuration.js';
import type { GateState } from './gate-state.js';
import type { Mesh } from './mesh.js';
import { resolveCircuit, stepStateAndChannel, type ResolvedCircuit } from './resolve-circuit.js';

/**
 * The one setting that serves every circuit using a gate. `phaseRad` is the outer phase some circuit asked for
 * (a coupler's phase, or a phase shifter on the waveguide the outer phase acts on); `phaseOwner` is that circuit.
 */
export type GateNeed = {
  readonly gate: number;
  readonly state: GateState;
  readonly kappa?: number | undefined;
  readonly phaseRad?: number | undefined;
  readonly phaseOwner?: string | undefined;
  /** Every circuit that uses the gate, in configuration order. */
  readonly circuits: readonly string[];
};

/** Two needs of one gate that no single setting can meet, or a phase asked where it cannot act. */
export type GateConflict = { readonly kind: 'state' | 'split' | 'phase'; readonly gate: number; readonly circuits: readonly string[]; readonly message: string };

/**
 * The waveguide (channel, the side used at end 0) whose light the outer phase of a bar or cross gate acts on:
 * the gate transfer puts phi on the side-a output going from end 0 to end 1 and, by reciprocity, on the side-a
 * input coming back, so in bar it is waveguide a (channel 0) and in cross the b-to-a crossing (channel 1).
 */
export function phasedChannel(state: 0 | 1): 0 | 1 {
  return state;
}

/** Whether the outer phase of the gate acts on the traversal `inPort -> outPort` (gate-port indices). */
export function phaseActsOnStep(inPort: number, outPort: number): boolean {
  const { state, channel } = stepStateAndChannel(inPort, outPort);
  return channel === phasedChannel(state);
}

type Draft = { state: GateState; kappa?: number; phaseRad?: number; phaseOwner?: string; phaseCarrier?: string; circuits: string[]; stateOf: string };

/**
 * Merges the needs of `circuits` gate by gate. A gate traversed by several circuits must be asked the same state;
 * a split gate belongs to one circuit; an outer phase serves the circuit whose light it acts on, so a circuit may set
 * it only where its own traversal is on that waveguide. Circuits that cannot be resolved contribute what resolves.
 */
export function gateNeeds(mesh: Mesh, circuits: readonly Circuit[] | readonly ResolvedCircuit[]): { needs: Map<number, GateNeed>; conflicts: GateConflict[] } {
  const resolved = circuits.map((c) => ('paths' in c && 'couplerGates' in c ? (c as ResolvedCircuit) : resolveCircuit(mesh, c as Circuit)));
  const drafts = new Map<number, Draft>();
  const conflicts: GateConflict[] = [];
  const gid = (g: number) => mesh.gates[g]!.id;
  const addUser = (d: Draft, id: string) => {
    if (!d.circuits.includes(id)) d.circuits.push(id);
  };
  for (const r of resolved) {
    const id = r.circuit.id;
    r.circuit.couplers.forEach((c) => {
      const g = mesh.gateIndex.get(c.gate);
      if (g === undefined) return;
      const d = drafts.get(g);
      if (d) {
        addUser(d, id);
        conflicts.push({ kind: 'split', gate: g, circuits: [...d.circuits], message: `gate ${c.gate} is a split coupler of ${id} but is already used by ${d.circuits.filter((x) => x !== id).join(' and ')}` });
        return;
      }
      drafts.set(g, { state: 'split', kappa: c.kappa, phaseRad: c.phaseRad, phaseOwner: id, circuits: [id], stateOf: id });
    });
  }
  for (const r of resolved) {
    const id = r.circuit.id;
    const couplers = new Set(r.couplerGates);
    for (const p of r.paths)
      for (const s of p.steps) {
        if (couplers.has(s.gate)) continue;
        const { state } = stepStateAndChannel(s.inPort, s.outPort);
        const name = state === 0 ? 'bar' : 'cross';
        const d = drafts.get(s.gate);
        if (!d) {
          drafts.set(s.gate, { state: name, circuits: [id], stateOf: id, ...(phaseActsOnStep(s.inPort, s.outPort) ? { phaseCarrier: id } : {}) });
          continue;
        }
        addUser(d, id);
        if (d.state === 'split') {
          conflicts.push({ kind: 'split', gate: s.gate, circuits: [...d.circuits], message: `split gate ${gid(s.gate)} of ${d.stateOf} is also traversed as ${name} by ${id}` });
        } else if (d.state !== name) {
          conflicts.push({ kind: 'state', gate: s.gate, circuits: [...d.circuits], message: `gate ${gid(s.gate)} is asked to be ${d.state} by ${d.stateOf} and ${name} by ${id}` });
        } else if (phaseActsOnStep(s.inPort, s.outPort)) d.phaseCarrier = d.phaseCarrier ?? id;
      }
  }
  for (const r of resolved) {
    const id = r.circuit.id;
    for (const ph of r.circuit.phases ?? []) {
      const g = mesh.gateIndex.get(ph.gate);
      const d = g === undefined ? undefined : drafts.get(g);
      if (g === undefined || !d || !d.circuits.includes(id)) {
        conflicts.push({ kind: 'phase', gate: g ?? -1, circuits: [id], message: `circuit ${id} sets the phase of gate ${ph.gate}, which it does not traverse` });
        continue;
      }
      if (d.state === 'split') {
        conflicts.push({ kind: 'phase', gate: g, circuits: [...d.circuits], message: `circuit ${id} sets a phase shifter on split gate ${ph.gate}; a coupler's phase belongs in its coupler entry` });
        continue;
      }
      if (d.phaseCarrier !== id) {
        const carrier = d.phaseCarrier ? `the light of ${d.phaseCarrier}` : 'no circuit\'s light';
        conflicts.push({ kind: 'phase', gate: g, circuits: [...new Set([id, ...(d.phaseCarrier ? [d.phaseCarrier] : [])])], message: `circuit ${id} sets the outer phase of gate ${ph.gate}, but that phase acts on ${carrier}, not on ${id}` });
        continue;
      }
      d.phaseRad = ph.phaseRad;
      d.phaseOwner = id;
    }
  }
  const needs = new Map<number, GateNeed>();
  for (const [g, d] of drafts)
    needs.set(g, {
      gate: g,
      state: d.state,
      ...(d.kappa !== undefined ? { kappa: d.kappa } : {}),
      ...(d.phaseRad !== undefined ? { phaseRad: d.phaseRad } : {}),
      ...(d.phaseOwner !== undefined ? { phaseOwner: d.phaseOwner } : d.phaseCarrier !== undefined ? { phaseOwner: d.phaseCarrier } : {}),
      circuits: d.circuits,
    });
  return { needs, conflicts };
}
