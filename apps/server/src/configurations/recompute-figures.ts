/** The figures of every circuit with a saved spec, recomputed from the content itself (never taken from the client). */
import type { CircuitFigures, CircuitSpec, ConfigurationFile } from '@hexloom/contracts';
import type { Configuration, Mesh } from '@hexloom/mesh';
import { savedFigures, verifySpec, type Verification } from '@hexloom/synth';

/** One circuit's verification against its saved spec. */
export type SpecVerdict = { circuitId: string; pass: boolean; failed: string[]; verification: Verification[] };

/**
 * Verifies each saved spec's circuit on the whole chip as `content` holds it (other circuits and their leakage
 * included) and returns the figures to save and each circuit's verdict. A spec whose circuit is not in the content
 * gets no figures and a failed verdict naming why.
 */
export function recomputeFigures(mesh: Mesh, content: ConfigurationFile, specs: readonly CircuitSpec[]): { figures: CircuitFigures; verdicts: SpecVerdict[] } {
  const figures: CircuitFigures = {};
  const verdicts: SpecVerdict[] = [];
  for (const s of specs) {
    const r = verifySpec({ spec: s.spec, mesh, configuration: content as Configuration, circuitId: s.circuitId });
    if (!r.ok) {
      verdicts.push({ circuitId: s.circuitId, pass: false, failed: [`${r.reason}: ${r.message}`], verification: [] });
      continue;
    }
    figures[s.circuitId] = savedFigures(r.verification, r.verdict);
    verdicts.push({ circuitId: s.circuitId, pass: r.verdict.pass, failed: r.verdict.failed.map((c) => `${c.quantity} at ${c.toName}: ${c.measured.toPrecision(4)} ${c.unit} (limit ${c.limit.toPrecision(4)} ${c.unit})`), verification: r.verification });
  }
  return { figures, verdicts };
}
