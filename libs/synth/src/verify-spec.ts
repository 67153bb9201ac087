/** Verifies a circuit already on a chip against the specification it was made from (re-designed, not re-placed). */
import type { FilterSpec } from '@hexloom/contracts';
import type { Configuration, Mesh } from '@hexloom/mesh';
import type { ImpulseOptions } from '@hexloom/solver';
import { designCircuit } from './design-circuit.js';
import { SynthInputError } from './synth-input-error.js';
import { verifyCircuit, type Verdict, type Verification } from './verify-circuit.js';

export type SpecCheck = { ok: true; verification: Verification[]; verdict: Verdict; basePs?: number } | { ok: false; reason: 'unknown-circuit' | 'impossible-design' | 'invalid-mask'; message: string };

/**
 * The design numbers of `spec` (deterministic) and the whole-chip verification of circuit `circuitId` as the
 * configuration holds it now: what its saved figures and verdict are after other circuits were placed or removed.
 */
export function verifySpec(input: { spec: FilterSpec; mesh: Mesh; configuration: Configuration; circuitId: string; impulse?: ImpulseOptions }): SpecCheck {
  const circuit = input.configuration.circuits.find((c) => c.id === input.circuitId);
  if (!circuit) return { ok: false, reason: 'unknown-circuit', message: `there is no circuit ${input.circuitId} in this configuration` };
  try {
    const { design, unitDelayS } = designCircuit(input.spec.spec, input.mesh.definition.technology);
    return { ok: true, ...verifyCircuit({ spec: input.spec, design, mesh: input.mesh, configuration: input.configuration, circuit, unitDelayS, ...(input.impulse ? { impulse: input.impulse } : {}) }) };
  } catch (error) {
    if (error instanceof SynthInputError) return { ok: false, reason: /mask|sample/.test(error.message) ? 'invalid-mask' : 'impossible-design', message: error.message };
    throw error;
  }
}

/**
 * The figures saved with a version for one circuit: its main outputs' figures (a delay set's carry `@<output name>`),
 * and how many of its checks failed out of how many, finite values only.
 */
export function savedFigures(verification: readonly Verification[], verdict: Verdict): Record<string, number> {
  const main = verification.filter((v) => v.role === 'main');
  const out: Record<string, number> = {};
  for (const v of main)
    for (const [name, value] of Object.entries(v.figures)) if (Number.isFinite(value)) out[main.length > 1 ? `${name}@${v.toName}` : name] = value;
  out.failedChecks = verdict.failed.length;
  out.checks = verdict.checkCount;
  return out;
}
