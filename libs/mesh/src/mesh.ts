/** The built mesh: cells, gates, vertices, boundary sites and external ports with their index tables. */
import type { Axial } from './axial.js';
import type { MeshDefinition, PortWiring } from './mesh-definition.js';
import type { CellId, GateId, GatePortLabel, PortId, VertexId } from './mesh-ids.js';

/** One cell of the mesh. */
export type MeshCell = { readonly index: number; readonly id: CellId; readonly q: number; readonly r: number };

/**
 * One gate (2x2 tunable coupler) on a cell edge. Side `a` is the anchor cell of the id, side `b`
 * its neighbour; a side outside the mesh has cell -1 (the outer waveguide of a boundary gate).
 */
export type MeshGate = {
  readonly index: number;
  readonly id: GateId;
  readonly anchor: Axial;
  /** 0 (e), 1 (ne) or 2 (nw). */
  readonly direction: number;
  /** Cell index on side a and side b, -1 when that side is outside the mesh. */
  readonly sideCells: readonly [number, number];
  /** Vertex index at end 0 and end 1. */
  readonly ends: readonly [number, number];
  readonly dead: boolean;
  readonly lossDb: number;
};

/** A cell corner where up to three gates meet; boundary vertices carry a site. */
export type MeshVertex = {
  readonly index: number;
  readonly id: VertexId;
  readonly gates: readonly number[];
  readonly boundary: boolean;
};

/** The outside sector of a boundary vertex: an I/O site (two external ports) or a bend. */
export type BoundarySite = {
  readonly vertex: VertexId;
  readonly kind: 'io' | 'bend';
  /** The two outer gate ports that meet at the site. */
  readonly gatePorts: readonly [number, number];
};

/** An external port of an I/O site, attached to one outer gate port. */
export type ExternalPort = {
  readonly index: number;
  readonly id: PortId;
  readonly site: VertexId;
  readonly gate: GateId;
  readonly gatePort: number;
  readonly wiredTo: PortWiring;
  readonly label: string | undefined;
};

/** What joins a gate port to the outside of its gate. */
export type LinkKind = 'none' | 'corner' | 'bend' | 'external';

/**
 * A mesh ready for routing and simulation. Gate ports are numbered `gate * 4 + side * 2 + end`
 * (side 0 = a, 1 = b); `link[p]` is the gate port that light leaving at p enters next (-1 if none),
 * and `portAt[p]` the external port attached at p (-1 if none).
 */
export type Mesh = {
  readonly definition: MeshDefinition;
  readonly cells: readonly MeshCell[];
  readonly gates: readonly MeshGate[];
  readonly vertices: readonly MeshVertex[];
  readonly sites: readonly BoundarySite[];
  readonly ports: readonly ExternalPort[];
  readonly link: Int32Array;
  readonly linkKind: readonly LinkKind[];
  readonly portAt: Int32Array;
  readonly cellIndex: ReadonlyMap<CellId, number>;
  readonly gateIndex: ReadonlyMap<GateId, number>;
  readonly vertexIndex: ReadonlyMap<VertexId, number>;
  /** External ports by id and by label. */
  readonly portIndex: ReadonlyMap<string, number>;
};

/** Index of a gate port. */
export function gatePortIndex(gate: number, side: number, end: number): number {
  return gate * 4 + side * 2 + end;
}

/** The `a0`..`b1` label of a gate port index. */
export function gatePortLabel(port: number): GatePortLabel {
  return `${(port & 2) === 0 ? 'a' : 'b'}${port & 1}` as GatePortLabel;
}

/** Side (0 = a, 1 = b) and end (0, 1) of a gate port label. */
export function parseGatePortLabel(label: GatePortLabel): { side: number; end: number } {
  return { side: label[0] === 'a' ? 0 : 1, end: label[1] === '0' ? 0 : 1 };
}
