/** Moves outer phases that only the gate settings record into the circuits that own them (older configurations). */
import type { Circuit, Configuration, PhaseSetting } from './configuration.js';
import { phaseActsOnStep } from './gate-needs.js';
import type { Mesh } from './mesh.js';
import { resolveCircuit } from './resolve-circuit.js';

/**
 * A circuit that declares no `phases` gets, for every non-coupler gate it traverses on the waveguide the outer phase
 * acts on, the phase its gate setting holds (when not 0). Circuits that declare phases are left as they are. This
 * keeps the tuning of configurations written before circuits carried their phases when circuits are later added or removed.
 */
export function declareSettingPhases(mesh: Mesh, configuration: Configuration): Configuration {
  const settings = new Map(configuration.gates.map((s) => [s.gate, s]));
  let changed = false;
  const circuits = configuration.circuits.map((c): Circuit => {
    if (c.phases !== undefined) return c;
    const r = resolveCircuit(mesh, c);
    const couplers = new Set(r.couplerGates);
    const phases: PhaseSetting[] = [];
    const seen = new Set<number>();
    for (const p of r.paths)
      for (const s of p.steps) {
        if (couplers.has(s.gate) || seen.has(s.gate) || !phaseActsOnStep(s.inPort, s.outPort)) continue;
        seen.add(s.gate);
        const id = mesh.gates[s.gate]!.id;
        const phaseRad = settings.get(id)?.phaseRad ?? 0;
        if (phaseRad !== 0) phases.push({ gate: id, phaseRad });
      }
    if (phases.length === 0) return c;
    changed = true;
    return { ...c, phases };
  });
  return changed ? { ...configuration, circuits } : configuration;
}
