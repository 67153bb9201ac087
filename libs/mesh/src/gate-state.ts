/** Gate states and the coupling convention of a gate. */
import type { GateId } from './mesh-ids.js';

/**
 * State of a gate. `bar`: light stays on its side (kappa = 0); `cross`: it changes side (kappa = 1);
 * `split`: power cross-coupling kappa in [0, 1] between the two sides.
 */
export type GateState = 'bar' | 'cross' | 'split';

/** The state in which a gate is held on the chip, and which circuit owns it. */
export type GateSetting = {
  readonly gate: GateId;
  readonly state: GateState;
  /** Power cross-coupling in [0, 1]; implied 0 for bar and 1 for cross. */
  readonly kappa?: number | undefined;
  /** Outer phase (on the side-a output waveguide), radians. */
  readonly phaseRad?: number | undefined;
  /** Id of the circuit that owns the gate. */
  readonly circuit?: string | undefined;
};

/** States in which idle gates may be parked. */
export type ParkedState = 'bar' | 'cross';

/** The cross-coupling of a state: 0 bar, 1 cross, the given kappa for split. */
export function gateKappa(setting: Pick<GateSetting, 'state' | 'kappa'>): number {
  if (setting.state === 'bar') return 0;
  if (setting.state === 'cross') return 1;
  return setting.kappa ?? 0.5;
}

/**
 * Internal phase theta of a balanced MZI gate for a cross-coupling kappa, with the convention
 * kappa = cos^2(theta / 2): theta = 0 is cross, theta = pi is bar (two ideal 3 dB couplers, common practice).
 */
export function gateThetaRad(kappa: number): number {
  return 2 * Math.acos(Math.sqrt(Math.min(1, Math.max(0, kappa))));
}
