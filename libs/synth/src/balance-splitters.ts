/** Split ratios of a splitter tree that give every output the same power after the loss of its own path. */
import type { Circuit, CircuitPath, Configuration, Mesh } from '@hexloom/mesh';

/** Loss of a path's gates (and of the boundary bends it turns through), dB. */
function pathLossDb(mesh: Mesh, path: CircuitPath): number {
  let loss = 0;
  path.steps.forEach((s, k) => {
    const g = mesh.gateIndex.get(s.gate);
    if (g === undefined) return;
    loss += mesh.gates[g]!.lossDb;
    if (k + 1 < path.steps.length) {
      const side = s.out[0] === 'a' ? 0 : 1;
      const out = g * 4 + side * 2 + (s.out[1] === '0' ? 0 : 1);
      if (mesh.linkKind[out] === 'bend') loss += mesh.definition.technology.bendLossDb;
    }
  });
  return loss;
}

/** Output port ids of a comb in its own order: the branch of each splitter along the trunk, then the trunk end. */
export function combOutputs(circuit: Circuit): string[] {
  const ends = circuit.paths.filter((p) => p.role === 'branch').map((p) => p.to);
  const buses = circuit.paths.filter((p) => p.role === 'bus');
  const last = buses[buses.length - 1]?.to;
  return [...ends, ...(last ? [last] : [])].flatMap((t) => ('port' in t ? [t.port] : []));
}

/** The share of the input power each output gets from the split ratios alone (trunk end last). */
function splitFractions(circuit: Circuit, buses: readonly CircuitPath[]): number[] {
  const out: number[] = [];
  let remaining = 1;
  circuit.couplers.forEach((c, j) => {
    const into = buses[j]!.to;
    const from = buses[j + 1]!.from;
    const trunkBar = 'at' in into && 'at' in from && into.at[0] === from.at[0];
    const branch = trunkBar ? c.kappa : 1 - c.kappa;
    out.push(remaining * branch);
    remaining *= 1 - branch;
  });
  out.push(remaining);
  return out;
}

const gateLossDb = (mesh: Mesh, gate: string): number => mesh.gates[mesh.gateIndex.get(gate) ?? -1]?.lossDb ?? 0;

/**
 * A comb with splitters s_0 .. s_{N-2} along its trunk: output j (branch of s_j, or the trunk end for j = N-1) sees
 * the split ratios times its path transmission L_j. Equal output power P needs sum_j P / L_j = 1 (every bit of power
 * leaves through an output on a lossless split), so P = 1 / sum(1 / L_j), and s_j sends (P / L_j) / R_j of what reaches
 * it, R_j = 1 - sum_{i<j} P / L_i (power bookkeeping, common practice). A splitter the trunk passes in bar sends its
 * branch the cross output (gate kappa = fraction); one passed in cross, the bar output (kappa = 1 - fraction).
 * With `measuredPowerDb` (each output's simulated power at the carrier, in output order) the path transmissions are
 * read from the simulation instead of the gate losses, so leakage is balanced too.
 * Returns the configuration unchanged if the circuit is not such a comb.
 */
export function balanceSplitters(mesh: Mesh, configuration: Configuration, circuit: Circuit, measuredPowerDb?: readonly number[]): { configuration: Configuration; circuit: Circuit; outputPowerDb: number[] } {
  const buses = circuit.paths.filter((p) => p.role === 'bus');
  const branches = circuit.paths.filter((p) => p.role === 'branch');
  const n = circuit.couplers.length;
  if (branches.length !== n || buses.length !== n + 1) return { configuration, circuit, outputPowerDb: [] };
  const lossDb: number[] = [];
  let trunk = 0;
  for (let j = 0; j < n; j++) {
    trunk += pathLossDb(mesh, buses[j]!) + gateLossDb(mesh, circuit.couplers[j]!.gate);
    lossDb.push(trunk + pathLossDb(mesh, branches[j]!));
  }
  lossDb.push(trunk + pathLossDb(mesh, buses[n]!));
  let transmission = lossDb.map((l) => 10 ** (-l / 10));
  if (measuredPowerDb && measuredPowerDb.length === n + 1) {
    // Measured output powers over the split each output got now give each path's real transmission (leakage included).
    const split = splitFractions(circuit, buses);
    transmission = measuredPowerDb.map((pDb, j) => 10 ** (pDb / 10) / (split[j] as number));
  }
  const p = 1 / transmission.reduce((s, t) => s + 1 / t, 0);
  let remaining = 1;
  const kappas = new Map<string, number>();
  const couplers = circuit.couplers.map((c, j) => {
    const fraction = p / transmission[j]! / remaining;
    remaining -= p / transmission[j]!;
    const into = buses[j]!.to;
    const out = buses[j + 1]!.from;
    const trunkBar = 'at' in into && 'at' in out && into.at[0] === out.at[0];
    const kappa = Math.min(1, Math.max(0, trunkBar ? fraction : 1 - fraction));
    kappas.set(c.gate, kappa);
    return { ...c, kappa };
  });
  const balanced: Circuit = { ...circuit, couplers };
  return {
    configuration: {
      ...configuration,
      circuits: configuration.circuits.map((c) => (c.id === circuit.id ? balanced : c)),
      gates: configuration.gates.map((g) => (kappas.has(g.gate) ? { ...g, kappa: kappas.get(g.gate) as number } : g)),
    },
    circuit: balanced,
    outputPowerDb: transmission.map(() => 10 * Math.log10(p)),
  };
}
