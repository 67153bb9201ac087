/** Turns a circuit's ids into gate-port indices and lists what cannot be resolved or does not connect. */
import type { Circuit, PathStep, PathTerminal } from './configuration.js';
import { gatePortIndex, parseGatePortLabel, type Mesh } from './mesh.js';
import { violation, type Violation } from './violation.js';

/** A gate traversal by gate-port indices: light enters at `inPort` and leaves at `outPort`. */
export type ResolvedStep = { readonly gate: number; readonly inPort: number; readonly outPort: number };

/** A terminal by indices: for a port, `gatePort` is where the external port attaches; for a gate, the coupler's port. */
export type ResolvedTerminal = { readonly kind: 'port'; readonly port: number; readonly gatePort: number } | { readonly kind: 'gate'; readonly gate: number; readonly gatePort: number };

export type ResolvedPath = { readonly from: ResolvedTerminal; readonly to: ResolvedTerminal; readonly steps: readonly ResolvedStep[] };

export type ResolvedCircuit = {
  readonly circuit: Circuit;
  readonly paths: readonly ResolvedPath[];
  /** Gate index of every coupler (split gate). */
  readonly couplerGates: readonly number[];
  readonly problems: readonly Violation[];
};

/** Bar (0) or cross (1) of a traversal, and the channel it occupies (the side it uses at end 0). */
export function stepStateAndChannel(inPort: number, outPort: number): { state: 0 | 1; channel: number } {
  const sIn = (inPort >> 1) & 1;
  const sOut = (outPort >> 1) & 1;
  return { state: sIn === sOut ? 0 : 1, channel: (inPort & 1) === 0 ? sIn : sOut };
}

/** Resolves a circuit against a mesh; never throws, problems are returned as violations. */
export function resolveCircuit(mesh: Mesh, circuit: Circuit): ResolvedCircuit {
  const problems: Violation[] = [];
  const cid = [circuit.id];
  const couplerGates: number[] = [];
  for (const c of circuit.couplers) {
    const g = mesh.gateIndex.get(c.gate);
    if (g === undefined) problems.push(violation('unknown-id', `circuit ${circuit.id}: coupler gate ${c.gate} is not a gate of this mesh`, { circuits: cid, gates: [c.gate] }));
    else couplerGates.push(g);
  }
  const terminal = (t: PathTerminal): ResolvedTerminal | undefined => {
    if ('port' in t) {
      const p = mesh.portIndex.get(t.port);
      if (p === undefined) {
        problems.push(violation('circuit-disconnected', `circuit ${circuit.id}: port ${t.port} is not an external port of this mesh`, { circuits: cid, ports: [t.port] }));
        return undefined;
      }
      return { kind: 'port', port: p, gatePort: mesh.ports[p]!.gatePort };
    }
    const g = mesh.gateIndex.get(t.gate);
    if (g === undefined || !circuit.couplers.some((c) => c.gate === t.gate)) {
      problems.push(violation('circuit-disconnected', `circuit ${circuit.id}: path terminal ${t.gate} is not one of its coupler gates`, { circuits: cid, gates: [t.gate] }));
      return undefined;
    }
    const { side, end } = parseGatePortLabel(t.at);
    return { kind: 'gate', gate: g, gatePort: gatePortIndex(g, side, end) };
  };
  const step = (s: PathStep): ResolvedStep | undefined => {
    const g = mesh.gateIndex.get(s.gate);
    if (g === undefined) {
      problems.push(violation('unknown-id', `circuit ${circuit.id}: gate ${s.gate} is not a gate of this mesh`, { circuits: cid, gates: [s.gate] }));
      return undefined;
    }
    const a = parseGatePortLabel(s.in);
    const b = parseGatePortLabel(s.out);
    if (a.end === b.end) {
      problems.push(violation('invalid-step', `circuit ${circuit.id}: step ${s.gate} ${s.in}>${s.out} enters and leaves at the same end`, { circuits: cid, gates: [s.gate] }));
      return undefined;
    }
    return { gate: g, inPort: gatePortIndex(g, a.side, a.end), outPort: gatePortIndex(g, b.side, b.end) };
  };
  const paths: ResolvedPath[] = [];
  circuit.paths.forEach((path, k) => {
    const from = terminal(path.from);
    const to = terminal(path.to);
    const steps = path.steps.map(step);
    if (!from || !to || steps.some((s) => s === undefined)) return;
    const ok = steps as ResolvedStep[];
    // Light leaves `from` into the first gate: a port feeds its own gate port, a coupler output feeds its link.
    const entry = (t: ResolvedTerminal) => (t.kind === 'port' ? t.gatePort : mesh.link[t.gatePort]!);
    const joined = (out: number, into: number) => mesh.link[out] === into && (mesh.linkKind[out] === 'corner' || mesh.linkKind[out] === 'bend');
    const gaps: string[] = [];
    if (ok.length === 0) {
      // With no step, a port may feed a coupler input directly, a coupler output may be a port, or two couplers are linked.
      const direct =
        from.kind === 'port' ? to.kind === 'gate' && from.gatePort === to.gatePort : to.kind === 'port' ? from.gatePort === to.gatePort : joined(from.gatePort, to.gatePort);
      if (!direct) gaps.push('its two terminals');
    } else {
      if (entry(from) !== ok[0]!.inPort) gaps.push(`the start and ${mesh.gates[ok[0]!.gate]!.id}`);
      for (let i = 1; i < ok.length; i++)
        if (!joined(ok[i - 1]!.outPort, ok[i]!.inPort)) gaps.push(`${mesh.gates[ok[i - 1]!.gate]!.id} and ${mesh.gates[ok[i]!.gate]!.id}`);
      if (entry(to) !== ok[ok.length - 1]!.outPort) gaps.push(`${mesh.gates[ok[ok.length - 1]!.gate]!.id} and the end`);
    }
    if (gaps.length > 0)
      problems.push(
        violation('circuit-disconnected', `circuit ${circuit.id}: path ${k} (${path.role}) does not connect between ${gaps.join('; ')}`, {
          circuits: cid,
          gates: ok.map((s) => mesh.gates[s.gate]!.id),
        }),
      );
    paths.push({ from, to, steps: ok });
  });
  return { circuit, paths, couplerGates, problems };
}
