/** The plain-data description of a chip: shape, I/O sites, port wiring, dead gates and technology. */
import type { Axial } from './axial.js';
import type { GateId, PortId, VertexId } from './mesh-ids.js';

/** Version of the mesh definition file format this library reads and writes. */
export const MESH_SCHEMA_VERSION = 1;

/**
 * Which cells the mesh has. `rectangle`: rows r = 0..rows-1, columns 0..columns-1 in "odd-r"
 * offset layout (q = column - floor(r / 2)); `hexagon`: all cells within hex distance `radius` of
 * (0,0); `cells`: an explicit list of axial positions.
 */
export type MeshShape =
  | { readonly kind: 'rectangle'; readonly rows: number; readonly columns: number }
  | { readonly kind: 'hexagon'; readonly radius: number }
  | { readonly kind: 'cells'; readonly cells: readonly Axial[] };

/** What an external port is connected to off the mesh. */
export type PortWiring = 'fibre' | 'modulator' | 'detector' | 'none';

/** The wiring (and an optional short label) of one external port. */
export type PortSpec = { readonly id: PortId; readonly wiredTo: PortWiring; readonly label?: string | undefined };

/** Thermal phase shifter figures: phase = offset + pi P / P_pi, P = V^2 / R (common practice). */
export type PhaseShifterProfile = {
  readonly piPowerW: number;
  readonly resistanceOhm: number;
  readonly maxPowerW: number;
  readonly maxVoltageV: number;
};

/** Technology figures of the chip; SI units, named in each field. */
export type TechnologyProfile = {
  /** Length of one gate plus its corner bend (one unit). */
  readonly unitLengthUm: number;
  readonly groupIndex: number;
  /** Optical reference (carrier) frequency f0 of the unit-delay model. */
  readonly referenceFrequencyHz: number;
  /** Insertion loss of one gate traversal. */
  readonly lossPerGateDb: number;
  /** Extra loss of a boundary bend. */
  readonly bendLossDb: number;
  /** Extinction of a gate in bar or cross (power ratio of wanted to unwanted output). */
  readonly extinctionDb: number;
  readonly phaseShifter: PhaseShifterProfile;
  /** Standard deviations of each coupler's splitting angle and of each phase, radians (tolerance studies). */
  readonly tolerance?: { readonly couplerSigmaRad: number; readonly phaseSigmaRad: number } | undefined;
};

/** A complete mesh definition (the `mesh` file format, see docs/formats.md). */
export type MeshDefinition = {
  readonly schemaVersion: number;
  readonly name: string;
  readonly shape: MeshShape;
  readonly technology: TechnologyProfile;
  /** Boundary sites used as I/O (two external ports each); every other boundary site is a bend. */
  readonly ioSites: readonly VertexId[];
  /** Wiring of external ports; a port of an I/O site not listed here is wired to `none`. */
  readonly ports: readonly PortSpec[];
  readonly deadGates: readonly GateId[];
  /** Per-gate loss that replaces `lossPerGateDb` (measured outliers). */
  readonly gateLossDb?: Readonly<Record<GateId, number>> | undefined;
};
