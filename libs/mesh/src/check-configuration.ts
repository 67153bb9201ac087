/** Lists every violation of a configuration: shared waveguides, inconsistent states, dead gates, ports, breaks. */
import type { Configuration } from './configuration.js';
import { gateNeeds } from './gate-needs.js';
import { gatePortLabel, type Mesh } from './mesh.js';
import { resolveCircuit, stepStateAndChannel, type ResolvedCircuit } from './resolve-circuit.js';
import { violation, type Violation } from './violation.js';

/** The checker's answer: `ok` when there is no violation. */
export type CheckResult = { readonly ok: boolean; readonly violations: readonly Violation[] };

type Use = { circuit: string; inPort: number; outPort: number; state: 0 | 1; channel: number };
const STATE_NAME = ['bar', 'cross'] as const;

/** A gate belongs to a region when one of its sides is a cell of the region. */
export function gateInRegion(mesh: Mesh, gate: number, region: ReadonlySet<number>): boolean {
  return mesh.gates[gate]!.sideCells.some((c) => c >= 0 && region.has(c));
}

/** Checks a configuration against its mesh (built from `configuration.mesh`). */
export function checkConfiguration(mesh: Mesh, configuration: Configuration): CheckResult {
  const out: Violation[] = [];
  const ids = new Set<string>();
  const resolved: ResolvedCircuit[] = [];
  for (const c of configuration.circuits) {
    if (ids.has(c.id)) out.push(violation('duplicate-circuit', `circuit id ${c.id} is used by two circuits`, { circuits: [c.id] }));
    ids.add(c.id);
    const r = resolveCircuit(mesh, c);
    out.push(...r.problems);
    resolved.push(r);
  }
  const uses = new Map<number, Use[]>();
  const couplerOwner = new Map<number, string[]>();
  const required = new Map<number, { state: 'bar' | 'cross' | 'split'; kappa?: number; circuit: string }>();
  const portUsers = new Map<number, string[]>();
  const addPort = (p: number, circuit: string) => portUsers.set(p, [...(portUsers.get(p) ?? []), circuit]);
  for (const r of resolved) {
    const id = r.circuit.id;
    const region = r.circuit.region ? new Set(r.circuit.region.map((c) => mesh.cellIndex.get(c) ?? -1)) : undefined;
    const seen = new Set<string>();
    const terminalPorts = new Map<number, { inputs: number[]; outputs: number[] }>();
    for (const g of r.couplerGates) {
      couplerOwner.set(g, [...(couplerOwner.get(g) ?? []), id]);
      const c = r.circuit.couplers.find((k) => k.gate === mesh.gates[g]!.id)!;
      required.set(g, { state: 'split', kappa: c.kappa, circuit: id });
      terminalPorts.set(g, { inputs: [], outputs: [] });
    }
    const circuitPorts = new Set<number>();
    for (const p of r.paths) {
      for (const t of [p.from, p.to]) if (t.kind === 'port') circuitPorts.add(t.port);
      if (p.from.kind === 'gate') terminalPorts.get(p.from.gate)?.outputs.push(p.from.gatePort);
      if (p.to.kind === 'gate') terminalPorts.get(p.to.gate)?.inputs.push(p.to.gatePort);
      for (const s of p.steps) {
        const key = `${s.inPort}>${s.outPort}`;
        if (seen.has(key)) continue; // the same traversal shared by two paths of one circuit (a common trunk)
        seen.add(key);
        const sc = stepStateAndChannel(s.inPort, s.outPort);
        uses.set(s.gate, [...(uses.get(s.gate) ?? []), { circuit: id, inPort: s.inPort, outPort: s.outPort, ...sc }]);
        if (region && !gateInRegion(mesh, s.gate, region))
          out.push(violation('outside-region', `circuit ${id} uses gate ${mesh.gates[s.gate]!.id} outside its region`, { circuits: [id], gates: [mesh.gates[s.gate]!.id] }));
      }
    }
    for (const p of circuitPorts) addPort(p, id);
    for (const p of r.circuit.ports) {
      const pi = mesh.portIndex.get(p);
      if (pi === undefined) out.push(violation('unknown-id', `circuit ${id} lists port ${p}, which is not an external port of this mesh`, { circuits: [id], ports: [p] }));
      else if (!circuitPorts.has(pi)) addPort(pi, id);
    }
    for (const [g, t] of terminalPorts) {
      const gid = mesh.gates[g]!.id;
      const all = [...t.inputs, ...t.outputs];
      const inEnds = new Set(t.inputs.map((p) => p & 1));
      const outEnds = new Set(t.outputs.map((p) => p & 1));
      const sameEnd = [...inEnds].some((e) => outEnds.has(e));
      if (new Set(all).size !== all.length || inEnds.size > 1 || outEnds.size > 1 || sameEnd)
        out.push(
          violation('coupler-misuse', `circuit ${id}: split gate ${gid} must take its inputs at one end and give its outputs at the other, each port once (${t.inputs.map(gatePortLabel).join(',')} in, ${t.outputs.map(gatePortLabel).join(',')} out)`, {
            circuits: [id],
            gates: [gid],
          }),
        );
    }
  }
  for (const [p, users] of portUsers)
    if (users.length > 1) out.push(violation('port-used-twice', `port ${mesh.ports[p]!.id} is used by ${users.join(' and ')}`, { circuits: users, ports: [mesh.ports[p]!.id] }));
  for (const [g, owners] of couplerOwner) {
    const gid = mesh.gates[g]!.id;
    if (owners.length > 1) out.push(violation('waveguide-used-twice', `split gate ${gid} is claimed by ${owners.join(' and ')}`, { circuits: owners, gates: [gid] }));
    const stepUsers = (uses.get(g) ?? []).map((u) => u.circuit);
    if (stepUsers.length > 0)
      out.push(violation('waveguide-used-twice', `split gate ${gid} of ${owners[0]} is also traversed as bar/cross by ${[...new Set(stepUsers)].join(' and ')}`, { circuits: [...owners, ...stepUsers], gates: [gid] }));
    if (mesh.gates[g]!.dead) out.push(violation('dead-gate-used', `dead gate ${gid} is used as a coupler by ${owners.join(' and ')}`, { circuits: owners, gates: [gid] }));
  }
  for (const [g, list] of uses) {
    const gid = mesh.gates[g]!.id;
    const circuits = [...new Set(list.map((u) => u.circuit))];
    if (mesh.gates[g]!.dead) out.push(violation('dead-gate-used', `dead gate ${gid} is used by ${circuits.join(' and ')}`, { circuits, gates: [gid] }));
    for (const ch of [0, 1]) {
      const onCh = list.filter((u) => u.channel === ch);
      if (onCh.length > 1)
        out.push(violation('waveguide-used-twice', `waveguide ${ch === 0 ? 'a' : 'b'} of gate ${gid} is used ${onCh.length} times (${onCh.map((u) => u.circuit).join(', ')})`, { circuits: [...new Set(onCh.map((u) => u.circuit))], gates: [gid] }));
    }
    const states = new Set(list.map((u) => u.state));
    if (states.size > 1) {
      const shared = circuits.length > 1;
      out.push(violation(shared ? 'shared-gate-conflict' : 'inconsistent-state', `gate ${gid} is asked to be both bar and cross (${circuits.join(', ')})${shared ? ': its two waveguides belong to circuits that need different states' : ''}`, { circuits, gates: [gid] }));
    }
    if (!couplerOwner.has(g)) required.set(g, { state: STATE_NAME[list[0]!.state], circuit: list[0]!.circuit });
  }
  // The gate settings must realise what the circuits need; idle gates sit in the parked state.
  const settings = new Map<number, Configuration['gates'][number]>();
  for (const s of configuration.gates) {
    const g = mesh.gateIndex.get(s.gate);
    if (g === undefined) out.push(violation('unknown-id', `gate setting names ${s.gate}, which is not a gate of this mesh`, { gates: [s.gate] }));
    else if (settings.has(g)) out.push(violation('inconsistent-state', `gate ${s.gate} has two settings`, { gates: [s.gate] }));
    else settings.set(g, s);
  }
  for (const [g, need] of required) {
    const gid = mesh.gates[g]!.id;
    const s = settings.get(g);
    const state = s?.state ?? configuration.parkedState;
    const kappaOk = need.state !== 'split' || Math.abs((s?.kappa ?? Number.NaN) - (need.kappa ?? 0)) <= 1e-9;
    if (state !== need.state || !kappaOk)
      out.push(
        violation('inconsistent-state', `gate ${gid} is set to ${state}${s?.kappa !== undefined ? ` (kappa ${s.kappa})` : ''} but circuit ${need.circuit} needs ${need.state}${need.kappa !== undefined ? ` (kappa ${need.kappa})` : ''}`, {
          circuits: [need.circuit],
          gates: [gid],
        }),
      );
  }
  // Outer phases: a circuit may set one only on the waveguide it acts on, and the setting must hold it.
  const { needs, conflicts } = gateNeeds(mesh, resolved);
  for (const c of conflicts)
    if (c.kind === 'phase') {
      const gates = c.gate >= 0 ? [mesh.gates[c.gate]!.id] : [];
      out.push(violation(c.circuits.length > 1 ? 'shared-gate-conflict' : 'ineffective-phase', c.message, { circuits: [...c.circuits], gates }));
    }
  for (const need of needs.values()) {
    if (need.phaseRad === undefined) continue;
    const gid = mesh.gates[need.gate]!.id;
    const have = settings.get(need.gate)?.phaseRad ?? 0;
    if (Math.abs(wrapPhase(have - need.phaseRad)) <= 1e-9) continue;
    const shared = need.circuits.length > 1;
    out.push(
      violation(shared ? 'shared-gate-conflict' : 'inconsistent-state', `gate ${gid}${shared ? ` (shared by ${need.circuits.join(' and ')})` : ''} has outer phase ${have} rad but circuit ${need.phaseOwner} needs ${need.phaseRad} rad`, {
        circuits: [...need.circuits],
        gates: [gid],
      }),
    );
  }
  for (const [g, s] of settings)
    if (s.circuit !== undefined && !required.has(g))
      out.push(violation('stale-setting', `gate ${s.gate} is still set for circuit ${s.circuit}, which does not use it`, { circuits: [s.circuit], gates: [s.gate] }));
  return { ok: out.length === 0, violations: out };
}

/** A phase difference wrapped into (-pi, pi]. */
function wrapPhase(x: number): number {
  const t = x % (2 * Math.PI);
  return t > Math.PI ? t - 2 * Math.PI : t <= -Math.PI ? t + 2 * Math.PI : t;
}
