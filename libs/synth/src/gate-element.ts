/** The complex field transfer of one gate traversal, exactly as the solver models it (at the reference frequency). */
import { gateKappa, type Configuration, type GatePortLabel, type GateSetting } from '@hexloom/mesh';
import { gateTransfer, thetaForKappa } from '@hexloom/solver';
import type { Complex } from './complex.js';

const sideOf = (label: GatePortLabel): 0 | 1 => (label[0] === 'a' ? 0 : 1);
const endOf = (label: GatePortLabel): 0 | 1 => (label[1] === '0' ? 0 : 1);

/** Settings by gate id, with idle gates in the parked state. */
export function settingLookup(configuration: Configuration): (gate: string) => GateSetting {
  const byGate = new Map(configuration.gates.map((g) => [g.gate, g]));
  return (gate) => byGate.get(gate) ?? { gate, state: configuration.parkedState };
}

/**
 * Field transfer from gate port `inLabel` to `outLabel` of a gate in `setting`: the solver's gate transfer T
 * for travel from end 0 to end 1 (element T[out side][in side]) or its transpose for the way back
 * (reciprocity). Loss is left out: only the phase and the coupling matter for tuning.
 */
export function gateElement(setting: GateSetting, extinctionDb: number, inLabel: GatePortLabel, outLabel: GatePortLabel): Complex {
  const t = gateTransfer({ thetaRad: thetaForKappa(gateKappa(setting)), phiRad: setting.phaseRad ?? 0, lossDb: 0, extinctionDb });
  const forward = endOf(inLabel) === 0;
  const row = forward ? sideOf(outLabel) : sideOf(inLabel);
  const column = forward ? sideOf(inLabel) : sideOf(outLabel);
  const k = 4 * row + 2 * column;
  return { re: t[k] as number, im: t[k + 1] as number };
}

/** True when the outer phase of the gate acts on this traversal (side-a output going forward, side-a input going back). */
export function phaseActsOn(inLabel: GatePortLabel, outLabel: GatePortLabel): boolean {
  return endOf(inLabel) === 0 ? sideOf(outLabel) === 0 : sideOf(inLabel) === 0;
}

/** The bar exit of a coupler entered at `label`: same side, other end. */
export function barExit(label: GatePortLabel): GatePortLabel {
  return `${label[0]}${label[1] === '0' ? '1' : '0'}` as GatePortLabel;
}

/** The cross exit of a coupler entered at `label`: other side, other end. */
export function crossExit(label: GatePortLabel): GatePortLabel {
  return `${label[0] === 'a' ? 'b' : 'a'}${label[1] === '0' ? '1' : '0'}` as GatePortLabel;
}
