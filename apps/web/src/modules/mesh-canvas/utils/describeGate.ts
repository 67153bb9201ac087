// A gate in words, for its accessible name and its tooltip.
import { formatNumber } from '../../figures/utils/formatFigure.js';
import type { GateLook } from './gateLooks.js';

/** The short state word used in a gate's accessible name: "bar", "split, kappa 0.3", "idle, parked in bar", "dead". */
export function gateStateWords(look: GateLook): string {
  if (look.state === 'split') return `split, kappa ${formatNumber(look.kappa ?? 0.5, 3)}`;
  if (look.state === 'idle') return look.parkedState ? `idle, parked in ${look.parkedState}` : 'idle';
  if (look.state === 'dead') return look.requestedState ? `dead (asked for ${look.requestedState})` : 'dead';
  return look.state;
}

/** The accessible name of a gate: "gate g(0,1)e, bar" (the state as one word: bar, cross, split, idle or dead). */
export function gateName(gateId: string, look: GateLook): string {
  return `gate ${gateId}, ${look.state}`;
}

/** The details after the name: "split, kappa 0.3, circuit notch", "idle, parked in bar". */
export function gateDetails(look: GateLook): string {
  const circuits = look.circuits.length === 0 ? '' : `, ${look.circuits.length === 1 ? 'circuit' : 'circuits'} ${look.circuits.join(' and ')}`;
  return `${gateStateWords(look)}${circuits}`;
}

/** The whole gate in words, for its tooltip: "gate g(0,1)e, bar, circuit notch". */
export function describeGate(gateId: string, look: GateLook): string {
  return `gate ${gateId}, ${gateDetails(look)}`;
}
