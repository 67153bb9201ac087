/** Chooses bar or cross for the idle gates around a circuit so that the light its gates leak comes back least. */
import { gateNeeds, type Circuit, type Configuration, type GateSetting, type Mesh } from '@hexloom/mesh';
import { netlistFromMesh, type GatePerturbation, type MeshNetlist, type Netlist } from '@hexloom/solver';

export type QuietParkingInput = {
  mesh: Mesh;
  configuration: Configuration;
  circuit: Circuit;
  /** Cost of a chip to minimise (e.g. the worst normalised delay error of the circuit's outputs). */
  cost: (chip: MeshNetlist, netlist: Netlist) => number;
  /** Stop once the cost is at most this. */
  goodEnough: number;
  /** Greedy passes over the candidate gates (default 2). */
  passes?: number;
  /** Cap on trial simulations (default 400). */
  maxEvaluations?: number;
  /** How many vertices away from the circuit's gates candidate idle gates may lie (default 2). */
  reach?: number;
};

export type QuietParkingResult = { configuration: Configuration; costBefore: number; costAfter: number; evaluations: number; gatesChanged: number };

/** Idle gates within `reach` vertices of the circuit's gates: those whose waveguides the circuit's leaked light reaches first. */
function candidateGates(mesh: Mesh, configuration: Configuration, circuit: Circuit, reach: number): number[] {
  const used = new Set(gateNeeds(mesh, configuration.circuits).needs.keys());
  const own = [...gateNeeds(mesh, [circuit]).needs.keys()];
  let frontier = new Set(own);
  const seen = new Set(own);
  for (let ring = 0; ring < reach && frontier.size > 0; ring++) {
    const next = new Set<number>();
    for (const g of frontier)
      for (const v of mesh.gates[g]!.ends)
        for (const h of mesh.vertices[v]!.gates)
          if (!seen.has(h)) {
            seen.add(h);
            next.add(h);
          }
    frontier = next;
  }
  // Gates parked on purpose (a setting without an owner) serve another circuit already; leave them.
  const parked = new Set(configuration.gates.filter((s) => s.circuit === undefined).map((s) => s.gate));
  return [...seen].filter((g) => !used.has(g) && !mesh.gates[g]!.dead && !parked.has(mesh.gates[g]!.id)).sort((a, b) => a - b);
}

/**
 * Greedy coordinate search: each candidate idle gate is tried in its other parking state and kept there when the cost
 * falls. Leakage is what couples a circuit to its idle neighbours (finite extinction), and whether leaked light returns
 * in phase depends on the loops the parked gates close (all-bar parking closes every cell into a ring resonant at the
 * carrier). Trials patch only the toggled gates of the compiled chip: the other state of a parked MZI gate is its
 * internal phase moved by pi (kappa = cos^2(theta / 2): theta = pi is bar, 0 is cross).
 */
export function quietParking({ mesh, configuration, circuit, cost, goodEnough, passes = 2, maxEvaluations = 400, reach = 2 }: QuietParkingInput): QuietParkingResult {
  const chip = netlistFromMesh({ mesh, configuration });
  const settings = new Map(configuration.gates.map((s) => [s.gate, s]));
  const stateOf = (g: number) => settings.get(mesh.gates[g]!.id)?.state ?? configuration.parkedState;
  const toggled = new Set<number>();
  const netlistWith = (set: ReadonlySet<number>): Netlist => {
    const p: Record<string, GatePerturbation> = {};
    for (const g of set) p[mesh.gates[g]!.id] = { thetaErrorRad: stateOf(g) === 'bar' ? -Math.PI : Math.PI };
    return set.size === 0 ? chip.netlist : chip.withPerturbations(p);
  };
  const costBefore = cost(chip, chip.netlist);
  let best = costBefore;
  let evaluations = 1;
  const candidates = candidateGates(mesh, configuration, circuit, reach);
  // First try every candidate in cross at once: crossed parking turns the closed cells of all-bar parking into open
  // zigzags that carry leaked light away to the chip's edge.
  const allCross = new Set(candidates.filter((g) => stateOf(g) === 'bar'));
  if (allCross.size > 0) {
    const c = cost(chip, netlistWith(allCross));
    evaluations++;
    if (c < best - 1e-9) {
      best = c;
      for (const g of allCross) toggled.add(g);
    }
  }
  for (let pass = 0; pass < passes && best > goodEnough; pass++) {
    let improved = false;
    for (const g of candidates) {
      if (best <= goodEnough || evaluations >= maxEvaluations) break;
      const trial = new Set(toggled);
      if (trial.has(g)) trial.delete(g);
      else trial.add(g);
      const c = cost(chip, netlistWith(trial));
      evaluations++;
      if (c < best - 1e-9) {
        best = c;
        if (toggled.has(g)) toggled.delete(g);
        else toggled.add(g);
        improved = true;
      }
    }
    if (!improved) break;
  }
  if (toggled.size === 0) return { configuration, costBefore, costAfter: best, evaluations, gatesChanged: 0 };
  const parking: GateSetting[] = [...toggled].map((g) => ({ gate: mesh.gates[g]!.id, state: stateOf(g) === 'bar' ? 'cross' : 'bar' }));
  const ids = new Set(parking.map((p) => p.gate));
  return { configuration: { ...configuration, gates: [...configuration.gates.filter((s) => !ids.has(s.gate)), ...parking] }, costBefore, costAfter: best, evaluations, gatesChanged: toggled.size };
}
