// The knobs of one circuit that live tuning offers: its couplers, its phase shifters and its loops.
import type { ConfigurationFile } from '@hexloom/contracts';
import type { Circuit } from '@hexloom/mesh';
import { unitDelayS } from '@hexloom/solver';
import { circuitLoops, phaseActsOn } from '@hexloom/synth';

/** A loop of the circuit: its length (units) and the gate whose outer phase tunes it. */
export type LoopKnob = { lengthUnits: number; tunerGate: string };

/** What can be tuned on a circuit, read from a configuration. */
export type CircuitKnobs = {
  couplers: { gate: string; role: string; kappa: number }[];
  phases: { gate: string; phaseRad: number }[];
  loops: LoopKnob[];
  /** Unit delay of the chip, s. */
  unitDelayS: number;
};

/** The circuit `circuitId` of `content`, or undefined. */
export function findCircuit(content: ConfigurationFile, circuitId: string): ConfigurationFile['circuits'][number] | undefined {
  return content.circuits.find((c) => c.id === circuitId);
}

/** Outer phase (rad) of `gate` in the gate settings of `content`, 0 when it sets none. */
export function gatePhaseRad(content: ConfigurationFile, gate: string): number {
  return content.gates.find((g) => g.gate === gate)?.phaseRad ?? 0;
}

/**
 * Couplers (gate, role, kappa), phase shifters (coupler gates and the circuit's recorded phases) and loops of the
 * circuit. A loop's tuner is its first traversed gate, not a coupler, whose outer phase acts on the loop (the rule
 * of libs/synth tuneLoops, so it is the gate synthesis tuned). Undefined when there is no such circuit.
 */
export function circuitKnobs(content: ConfigurationFile, circuitId: string): CircuitKnobs | undefined {
  const circuit = findCircuit(content, circuitId);
  if (!circuit) return undefined;
  const kappaOf = (gate: string, fallback: number): number => content.gates.find((g) => g.gate === gate)?.kappa ?? fallback;
  const couplers = circuit.couplers.map((c) => ({ gate: c.gate, role: c.role, kappa: kappaOf(c.gate, c.kappa) }));
  const phaseGates = [...new Set([...circuit.couplers.map((c) => c.gate), ...(circuit.phases ?? []).map((p) => p.gate)])];
  const loops = circuitLoops(circuit as Circuit).flatMap((loop): LoopKnob[] => {
    const tuner = loop.traversals.find((t) => !t.coupler && phaseActsOn(t.in, t.out));
    return tuner ? [{ lengthUnits: loop.lengthUnits, tunerGate: tuner.gate }] : [];
  });
  const { unitLengthUm, groupIndex } = content.mesh.technology;
  return { couplers, phases: phaseGates.map((gate) => ({ gate, phaseRad: gatePhaseRad(content, gate) })), loops, unitDelayS: unitDelayS({ unitLengthUm, groupIndex }) };
}
