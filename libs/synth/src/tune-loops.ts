/** Puts the resonance of every loop of a circuit at a chosen offset by setting one phase shifter in each loop. */
import type { Circuit, Configuration, GateSetting } from '@hexloom/mesh';
import { cArg } from './complex.js';
import { circuitLoops, type CircuitLoop } from './circuit-loops.js';
import { gateElement, phaseActsOn, settingLookup } from './gate-element.js';
import { setCircuitPhases } from './set-circuit-phases.js';
import { SynthInputError } from './synth-input-error.js';

export type LoopTuning = { gate: string; phaseRad: number; lengthUnits: number };

const TWO_PI = 2 * Math.PI;
const wrap = (x: number): number => ((x % TWO_PI) + TWO_PI) % TWO_PI;

/**
 * Each loop resonates where its round trip, coupler passes included, has phase 0 mod 2 pi: with one unit
 * delay z^-1 = exp(-j 2 pi (f - f0) T_u) per traversal, the loop of L units resonates at offset f_c when the
 * phase of its elements at f0 is 2 pi f_c L T_u (ring resonance condition, Yariv 2000). One gate of the loop
 * whose outer phase acts on the loop carries the correction (it acts on no other waveguide); the circuit records it.
 * @throws SynthInputError when a loop has no gate whose phase can tune it.
 */
export function tuneLoops(configuration: Configuration, circuit: Circuit, input: { offsetsHz: readonly number[]; unitDelayS: number; extinctionDb: number }): { configuration: Configuration; tunings: LoopTuning[] } {
  const loops: CircuitLoop[] = circuitLoops(circuit);
  const settingOf = settingLookup(configuration);
  const updated = new Map<string, GateSetting>(configuration.gates.map((g) => [g.gate, g]));
  const tunings: LoopTuning[] = [];
  loops.forEach((loop, i) => {
    const candidates = loop.traversals.filter((t) => !t.coupler && phaseActsOn(t.in, t.out));
    // The outer phase acts on one waveguide of a gate only, so a gate whose other waveguide carries another
    // circuit is as good a tuner as any (that circuit's light does not see the phase).
    const tuner = candidates[0];
    if (!tuner) throw new SynthInputError(`synth: loop ${i + 1} of circuit ${circuit.id} has no gate whose phase shifter acts on it`);
    const base = loop.traversals.reduce((sum, t) => {
      const setting = updated.get(t.gate) ?? settingOf(t.gate);
      const withoutTuner = t.gate === tuner.gate ? { ...setting, phaseRad: 0 } : setting;
      return sum + cArg(gateElement(withoutTuner, input.extinctionDb, t.in, t.out));
    }, 0);
    const offsetHz = input.offsetsHz[i] ?? input.offsetsHz[0] ?? 0;
    const phaseRad = wrap(TWO_PI * offsetHz * loop.lengthUnits * input.unitDelayS - base);
    const current = updated.get(tuner.gate) ?? settingOf(tuner.gate);
    updated.set(tuner.gate, { ...current, phaseRad });
    tunings.push({ gate: tuner.gate, phaseRad, lengthUnits: loop.lengthUnits });
  });
  const tuned = setCircuitPhases(configuration, circuit.id, tunings.map((t) => ({ gate: t.gate, phaseRad: t.phaseRad })));
  return { configuration: tuned, tunings };
}
