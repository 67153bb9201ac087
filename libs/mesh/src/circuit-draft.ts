/** A circuit under construction in index form, and its conversion to the plain configuration form. */
import type { Circuit, CircuitKind, CircuitPath, CouplerGate, PathRole, PathTerminal } from './configuration.js';
import { gatePortLabel, type Mesh } from './mesh.js';
import type { ResolvedStep, ResolvedTerminal } from './resolve-circuit.js';

export type DraftPath = { readonly role: PathRole; readonly from: ResolvedTerminal; readonly to: ResolvedTerminal; readonly steps: readonly ResolvedStep[] };
export type DraftCoupler = { readonly gate: number; readonly role: CouplerGate['role']; readonly kappa: number; readonly phaseRad: number };
export type CircuitDraft = { readonly paths: readonly DraftPath[]; readonly couplers: readonly DraftCoupler[] };

export const portTerminal = (mesh: Mesh, port: number): ResolvedTerminal => ({ kind: 'port', port, gatePort: mesh.ports[port]!.gatePort });
export const gateTerminal = (gatePort: number): ResolvedTerminal => ({ kind: 'gate', gate: gatePort >> 2, gatePort });

function terminal(mesh: Mesh, t: ResolvedTerminal): PathTerminal {
  return t.kind === 'port' ? { port: mesh.ports[t.port]!.id } : { gate: mesh.gates[t.gate]!.id, at: gatePortLabel(t.gatePort) };
}

/** The plain circuit of a draft. */
export function draftToCircuit(mesh: Mesh, draft: CircuitDraft, meta: { id: string; kind: CircuitKind; region?: readonly string[] | undefined }): Circuit {
  const paths: CircuitPath[] = draft.paths.map((p) => ({
    role: p.role,
    from: terminal(mesh, p.from),
    to: terminal(mesh, p.to),
    steps: p.steps.map((s) => ({ gate: mesh.gates[s.gate]!.id, in: gatePortLabel(s.inPort), out: gatePortLabel(s.outPort) })),
  }));
  const ports = [...new Set(draft.paths.flatMap((p) => [p.from, p.to]).flatMap((t) => (t.kind === 'port' ? [mesh.ports[t.port]!.id] : [])))];
  const couplers: CouplerGate[] = draft.couplers.map((c) => ({ gate: mesh.gates[c.gate]!.id, role: c.role, kappa: c.kappa, phaseRad: c.phaseRad }));
  return { id: meta.id, kind: meta.kind, ports, paths, couplers, ...(meta.region ? { region: [...meta.region] } : {}) };
}

/**
 * The gate's power cross-coupling that moves `requested` of the power off a path entering at
 * `inPort` and nominally leaving at `outPort`: the requested value when the nominal traversal is
 * bar, 1 - requested when it is cross (then "staying on the path" is the cross output).
 */
export function crossKappa(inPort: number, outPort: number, requested: number): number {
  return ((inPort >> 1) & 1) === ((outPort >> 1) & 1) ? requested : 1 - requested;
}
