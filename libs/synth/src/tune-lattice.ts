/** Sets the arm phases of a placed Mach–Zehnder lattice so that the chip realises the designed lattice exactly. */
import type { Circuit, CircuitPath, Configuration, GatePortLabel, GateSetting } from '@hexloom/mesh';
import { cArg, cDiv, cMul, cx, type Complex } from './complex.js';
import { gateElement, phaseActsOn, settingLookup } from './gate-element.js';
import type { LatticeParameters } from './lattice-response.js';
import { setCircuitPhases } from './set-circuit-phases.js';
import { SynthInputError } from './synth-input-error.js';

type Matrix = [[Complex, Complex], [Complex, Complex]];

const TWO_PI = 2 * Math.PI;
const wrap = (x: number): number => ((x % TWO_PI) + TWO_PI) % TWO_PI;
const otherSide = (label: GatePortLabel): GatePortLabel => `${label[0] === 'a' ? 'b' : 'a'}${label[1]}` as GatePortLabel;

/**
 * The designed angles made non-negative: L(-theta) = S L(theta) S with S = diag(1, -1), and S merges into the
 * neighbouring delay stages as a phase of pi (S is diagonal, like the stages); at the two ends it touches only the
 * unused port. Returns the couplers' angles in [0, pi/2] and the stage phases to match.
 */
export function canonicalLattice(design: LatticeParameters): { angles: number[]; phases: number[] } {
  const angles = design.couplerAnglesRad.map(Math.abs);
  const phases = [...design.stagePhasesRad];
  design.couplerAnglesRad.forEach((theta, k) => {
    if (theta >= 0) return;
    if (k > 0) phases[k - 1] = (phases[k - 1] as number) + Math.PI;
    if (k < phases.length) phases[k] = (phases[k] as number) + Math.PI;
  });
  return { angles, phases };
}

/** C = D1 L(theta) D2 with L = [[c, -j s], [-j s, c]], D1 = diag(a0, a1), D2 = diag(1, b): the diagonal phases of a coupler. */
function decompose(m: Matrix): { theta: number; d1: [Complex, Complex]; d2: [Complex, Complex] } {
  const c = Math.hypot(m[0][0].re, m[0][0].im);
  const s = Math.hypot(m[1][0].re, m[1][0].im);
  const theta = Math.atan2(s, c);
  const minusJ = cx(0, -1);
  if (s < 1e-9) return { theta, d1: [cDiv(m[0][0], cx(c)), cDiv(m[1][1], cx(c))], d2: [cx(1), cx(1)] };
  const a1 = cDiv(m[1][0], cMul(minusJ, cx(s)));
  if (c < 1e-9) return { theta, d1: [cDiv(m[0][1], cMul(minusJ, cx(s))), a1], d2: [cx(1), cx(1)] };
  const a0 = cDiv(m[0][0], cx(c));
  return { theta, d1: [a0, a1], d2: [cx(1), cDiv(m[1][1], cMul(a1, cx(c)))] };
}

const product = (path: CircuitPath, settingOf: (g: string) => GateSetting, extinctionDb: number, skip?: string): Complex =>
  path.steps.reduce((acc, s) => cMul(acc, gateElement(s.gate === skip ? { ...settingOf(s.gate), phaseRad: 0 } : settingOf(s.gate), extinctionDb, s.in, s.out)), cx(1));

/**
 * The placed lattice is: bus -> coupler 0 -> (short arm on the bus, long arm beside it) -> coupler 1 -> ... -> bus.
 * In the lattice's own frame index 0 is the long arm, so the couplers are C_0 = P M_0, C_k = P M_k P, C_N = M_N P
 * (M in the bus frame, P the swap). Each stage's phase is exp(-j phi) = D2_k[0] rho_k D1_{k-1}[0] / (D2_k[1] D1_{k-1}[1]),
 * rho_k = long-arm / short-arm transfer; one phase shifter on the long arm sets it to the design (Madsen & Zhao
 * 1999, sec. 4.5, lattice model; exact phase bookkeeping of the actual gates).
 */
export function tuneLattice(configuration: Configuration, circuit: Circuit, design: LatticeParameters, extinctionDb: number): Configuration {
  const n = design.stagePhasesRad.length;
  const arms = circuit.paths.filter((p) => p.role === 'arm');
  if (arms.length !== 2 * n || circuit.couplers.length !== n + 1) throw new SynthInputError(`synth: circuit ${circuit.id} is not a lattice of ${n} stages`);
  const settingOf = settingLookup(configuration);
  const updated = new Map<string, GateSetting>(configuration.gates.map((g) => [g.gate, g]));
  const lookup = (g: string): GateSetting => updated.get(g) ?? settingOf(g);
  const busIn = circuit.paths[0];
  if (!busIn || !('gate' in busIn.to)) throw new SynthInputError(`synth: circuit ${circuit.id} has no input bus`);
  // Bus-frame matrix of coupler k: inputs [bus, other], outputs [bus, other].
  const busFrame = (k: number, inBus: GatePortLabel, outBus: GatePortLabel): Matrix => {
    const gate = circuit.couplers[k]!.gate;
    const s = lookup(gate);
    const e = (i: GatePortLabel, o: GatePortLabel): Complex => gateElement(s, extinctionDb, i, o);
    return [
      [e(inBus, outBus), e(otherSide(inBus), outBus)],
      [e(inBus, otherSide(outBus)), e(otherSide(inBus), otherSide(outBus))],
    ];
  };
  const swapRows = (m: Matrix): Matrix => [m[1], m[0]];
  const swapColumns = (m: Matrix): Matrix => [[m[0][1], m[0][0]], [m[1][1], m[1][0]]];
  const inLabels: GatePortLabel[] = [busIn.to.at];
  const outLabels: GatePortLabel[] = [];
  for (let k = 0; k < n; k++) {
    const short = arms[2 * k]!;
    if (!('gate' in short.from) || !('gate' in short.to)) throw new SynthInputError(`synth: arm ${k} of ${circuit.id} does not join two couplers`);
    outLabels.push(short.from.at);
    inLabels.push(short.to.at);
  }
  const busOut = circuit.paths[circuit.paths.length - 1]!;
  if (!('gate' in busOut.from)) throw new SynthInputError(`synth: circuit ${circuit.id} has no output bus`);
  outLabels.push(busOut.from.at);
  const canonical = (k: number): Matrix => {
    const m = busFrame(k, inLabels[k]!, outLabels[k]!);
    return k === 0 ? swapRows(m) : k === n ? swapColumns(m) : swapRows(swapColumns(m));
  };
  const target = canonicalLattice(design);
  const phases: { gate: string; phaseRad: number }[] = [];
  const parts = Array.from({ length: n + 1 }, (_, k) => decompose(canonical(k)));
  for (let k = 1; k <= n; k++) {
    const short = arms[2 * (k - 1)]!;
    const long = arms[2 * (k - 1) + 1]!;
    const tuner = long.steps.find((s) => phaseActsOn(s.in, s.out));
    if (!tuner) throw new SynthInputError(`synth: the long arm of stage ${k} of ${circuit.id} has no gate whose phase acts on it`);
    const rho = cDiv(product(long, lookup, extinctionDb, tuner.gate), product(short, lookup, extinctionDb));
    const r = cDiv(cMul(cMul(parts[k]!.d2[0], rho), parts[k - 1]!.d1[0]), cMul(parts[k]!.d2[1], parts[k - 1]!.d1[1]));
    // exp(-j phi_target) = R(0) exp(j psi)  =>  psi = -phi_target - arg R(0).
    const psi = wrap(-(target.phases[k - 1] as number) - cArg(r));
    const current = lookup(tuner.gate);
    updated.set(tuner.gate, { ...current, phaseRad: psi });
    phases.push({ gate: tuner.gate, phaseRad: psi });
  }
  return setCircuitPhases(configuration, circuit.id, phases);
}
