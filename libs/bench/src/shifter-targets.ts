/** The phase every phase shifter of a chip must hold for a configuration. */
import { gateKappa, gateThetaRad, type Configuration, type GateSetting, type Mesh } from '@hexloom/mesh';
import type { ShifterKind } from './shifter-calibration.js';

/** Target phase of one shifter and the gate setting it realises. */
export type ShifterTarget = { readonly gate: string; readonly shifter: ShifterKind; readonly phaseRad: number; readonly setting: GateSetting };

/**
 * Every live gate gets two targets: `theta` = 2 acos(sqrt(kappa)) (the mesh's convention
 * kappa = cos^2(theta / 2), so bar is pi and cross is 0) and `phi` = the outer phase (0 when unset).
 * Idle gates hold the parked state; dead gates are not driven.
 */
export function shifterTargets(mesh: Mesh, configuration: Configuration): ShifterTarget[] {
  const settings = new Map(configuration.gates.map((g) => [g.gate, g]));
  const out: ShifterTarget[] = [];
  for (const gate of mesh.gates) {
    if (gate.dead) continue;
    const setting: GateSetting = settings.get(gate.id) ?? { gate: gate.id, state: configuration.parkedState };
    out.push({ gate: gate.id, shifter: 'theta', phaseRad: gateThetaRad(gateKappa(setting)), setting });
    out.push({ gate: gate.id, shifter: 'phi', phaseRad: setting.phaseRad ?? 0, setting });
  }
  return out;
}
