// What each gate of a mesh looks like for a given configuration: its state, coupling and owning circuits.
import type { ConfigurationFile } from '@hexloom/contracts';
import type { Mesh } from '@hexloom/mesh';
import type { CanvasGateState } from './canvasGateState.js';

/** The look of one gate. */
export type GateLook = {
  state: CanvasGateState;
  /** Power cross-coupling of a split gate. */
  kappa?: number | undefined;
  /** State an idle gate is parked in, when a configuration says. */
  parkedState?: 'bar' | 'cross' | undefined;
  /** State the configuration asks of a gate the chip marks dead. */
  requestedState?: 'bar' | 'cross' | 'split' | undefined;
  /** Circuits that traverse or split on the gate (ids, in configuration order). */
  circuits: string[];
  /** Index in `configuration.circuits` of the first of them, for its colour; null when none. */
  circuitIndex: number | null;
};

/**
 * The look of every gate of `mesh`, by gate id. Without a configuration every gate is idle (or dead);
 * with one, listed gates take their setting and unlisted gates are parked. Dead wins over any setting.
 */
export function gateLooks(mesh: Mesh, configuration?: ConfigurationFile): Map<string, GateLook> {
  const settings = new Map((configuration?.gates ?? []).map((s) => [s.gate, s]));
  const owners = new Map<string, string[]>();
  const claim = (gate: string, circuit: string) => {
    const list = owners.get(gate) ?? [];
    if (!list.includes(circuit)) list.push(circuit);
    owners.set(gate, list);
  };
  const circuits = configuration?.circuits ?? [];
  for (const c of circuits) {
    for (const p of c.paths) for (const s of p.steps) claim(s.gate, c.id);
    for (const k of c.couplers) claim(k.gate, c.id);
  }
  for (const s of configuration?.gates ?? []) if (s.circuit) claim(s.gate, s.circuit);
  const circuitOrder = new Map(circuits.map((c, i) => [c.id, i]));
  const looks = new Map<string, GateLook>();
  for (const gate of mesh.gates) {
    const setting = settings.get(gate.id);
    const list = owners.get(gate.id) ?? [];
    const first = list.map((id) => circuitOrder.get(id)).find((i) => i !== undefined);
    const base = { circuits: list, circuitIndex: first ?? null };
    if (gate.dead) looks.set(gate.id, { ...base, state: 'dead', requestedState: setting?.state });
    else if (setting) looks.set(gate.id, { ...base, state: setting.state, kappa: setting.state === 'split' ? (setting.kappa ?? 0.5) : undefined });
    else looks.set(gate.id, { ...base, state: 'idle', parkedState: configuration?.parkedState });
  }
  return looks;
}
