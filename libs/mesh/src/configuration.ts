/** A chip configuration: gate states plus the circuits that own them, in plain data. */
import type { GateSetting, ParkedState } from './gate-state.js';
import type { MeshDefinition } from './mesh-definition.js';
import type { GateId, GatePortLabel, PortId } from './mesh-ids.js';

/** Version of the configuration file format. */
export const CONFIGURATION_SCHEMA_VERSION = 1;

/** One gate traversal of a path: enter at gate port `in`, leave at `out` (other end); same side = bar. */
export type PathStep = { readonly gate: GateId; readonly in: GatePortLabel; readonly out: GatePortLabel };

/** Where a path starts or ends: an external port, or a port of one of the circuit's split gates. */
export type PathTerminal = { readonly port: PortId } | { readonly gate: GateId; readonly at: GatePortLabel };

/**
 * A waveguide path through bar/cross gates from one terminal to another. A `from` gate terminal is
 * an output port of a split gate; a `to` gate terminal is an input port of one.
 */
export type CircuitPath = {
  readonly role: PathRole;
  readonly from: PathTerminal;
  readonly to: PathTerminal;
  readonly steps: readonly PathStep[];
};

export type PathRole = 'bus' | 'ring' | 'arm' | 'branch' | 'feed';

/**
 * A split gate of a circuit (ring coupler, splitter, combiner, ring-to-ring coupler). `kappa` is the
 * gate's power cross-coupling (to the other side), the same value as its gate setting; the router
 * converts a requested path-to-path coupling k into 1 - k where the paths pass the gate in cross.
 */
export type CouplerGate = {
  readonly gate: GateId;
  readonly role: 'ring-coupler' | 'splitter' | 'combiner' | 'ring-ring';
  readonly kappa: number;
  readonly phaseRad: number;
};

export type CircuitKind = 'path' | 'delay-line' | 'ring' | 'add-drop-ring' | 'coupled-rings' | 'mzi' | 'mzi-lattice' | 'splitter-tree' | 'rings-on-bus';

/**
 * A phase shifter a circuit sets on a gate it traverses in bar or cross: the gate's outer phase, which acts on
 * the light of one of the gate's two waveguides only (see `phasedChannel`), so it belongs to that circuit.
 */
export type PhaseSetting = { readonly gate: GateId; readonly phaseRad: number };

/** A circuit placed on the chip. */
export type Circuit = {
  readonly id: string;
  readonly kind: CircuitKind;
  /** External ports the circuit owns. */
  readonly ports: readonly PortId[];
  readonly paths: readonly CircuitPath[];
  readonly couplers: readonly CouplerGate[];
  /** Outer phases the circuit sets on gates it traverses (loop tuning, lattice arm phases). */
  readonly phases?: readonly PhaseSetting[] | undefined;
  /** Optional region (cell ids) the circuit was asked to stay inside. */
  readonly region?: readonly string[] | undefined;
};

/** A configuration file: the mesh, the parked state of idle gates, gate settings and circuits. */
export type Configuration = {
  readonly schemaVersion: number;
  readonly mesh: MeshDefinition;
  readonly parkedState: ParkedState;
  /** Every gate not parked; a gate not listed is in `parkedState`. */
  readonly gates: readonly GateSetting[];
  readonly circuits: readonly Circuit[];
};
