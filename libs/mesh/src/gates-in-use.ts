/** The gates a configuration's circuits use, and those of them a chip marks dead. */
import type { Configuration } from './configuration.js';
import type { GateId } from './mesh-ids.js';

/** Every gate a circuit of the configuration traverses or splits on. */
export function gatesInUse(configuration: Pick<Configuration, 'circuits'>): Set<GateId> {
  const out = new Set<GateId>();
  for (const c of configuration.circuits) {
    for (const p of c.paths) for (const s of p.steps) out.add(s.gate);
    for (const k of c.couplers) out.add(k.gate);
  }
  return out;
}

/** The gates in use that are in `deadGates` (e.g. the chip's current list), sorted. */
export function deadGatesInUse(configuration: Pick<Configuration, 'circuits'>, deadGates: readonly GateId[]): GateId[] {
  const used = gatesInUse(configuration);
  return deadGates.filter((g) => used.has(g)).sort();
}
