/** What a user asks the router to place; ports are given by id or by label. */
import type { PathMetric } from './shortest-by-metric.js';

type Common = {
  /** Id of the new circuit (unique in the configuration). */
  readonly id: string;
  /** Cells (ids) the circuit must stay inside; a gate belongs to a region when one of its sides does. */
  readonly region?: readonly string[] | undefined;
  /** Search-node cap per exact-length search (default 200,000). */
  readonly budget?: number | undefined;
};

/** Shortest path between two ports. */
export type PathRequest = Common & { readonly kind: 'path'; readonly from: string; readonly to: string; readonly metric?: PathMetric | undefined };
/** A path of exactly `lengthUnits` units (a delay line). */
export type DelayLineRequest = Common & { readonly kind: 'delay-line'; readonly from: string; readonly to: string; readonly lengthUnits: number };
/** An all-pass ring of `perimeterUnits` coupled (power coupling `kappa`) to a bus from `from` to `to`. */
export type RingRequest = Common & {
  readonly kind: 'ring';
  readonly from: string;
  readonly to: string;
  readonly perimeterUnits: number;
  readonly kappa: number;
  readonly phaseRad?: number | undefined;
};
/** An add-drop ring: bus `from` -> `to`, second bus `add` -> `drop`. */
export type AddDropRingRequest = Common & {
  readonly kind: 'add-drop-ring';
  readonly from: string;
  readonly to: string;
  readonly add?: string | undefined;
  readonly drop: string;
  readonly perimeterUnits: number;
  readonly kappa: number;
  readonly dropKappa?: number | undefined;
};
/** A chain of `rings` adjacent single-cell rings; kappas: bus-ring, ring-ring ..., ring-bus (rings + 1 values). */
export type CoupledRingsRequest = Common & {
  readonly kind: 'coupled-rings';
  readonly from: string;
  readonly to: string;
  readonly drop: string;
  readonly add?: string | undefined;
  readonly rings: number;
  readonly kappas: readonly number[];
};
/** One Mach-Zehnder stage: the second arm longer than the first by `lengthDifferenceUnits` (0, 2, 4, ...). */
export type MziRequest = Common & { readonly kind: 'mzi'; readonly from: string; readonly to: string; readonly lengthDifferenceUnits: number; readonly kappas?: readonly number[] | undefined };
/** A lattice of Mach-Zehnder stages in cascade (stages + 1 couplers). */
export type MziLatticeRequest = Common & {
  readonly kind: 'mzi-lattice';
  readonly from: string;
  readonly to: string;
  readonly lengthDifferencesUnits: readonly number[];
  readonly kappas?: readonly number[] | undefined;
};
/** A 1xN splitter tree; each output receives light after exactly `delayUnits` units from `from`. */
export type SplitterTreeRequest = Common & {
  readonly kind: 'splitter-tree';
  readonly from: string;
  readonly outputs: readonly { readonly port: string; readonly delayUnits: number }[];
};

/** Several all-pass rings in series on one bus from `from` to `to` (each its own perimeter and bus coupling). */
export type RingsOnBusRequest = Common & {
  readonly kind: 'rings-on-bus';
  readonly from: string;
  readonly to: string;
  readonly rings: readonly { readonly perimeterUnits: number; readonly kappa: number }[];
};

export type RouteRequest = PathRequest | DelayLineRequest | RingRequest | AddDropRingRequest | CoupledRingsRequest | MziRequest | MziLatticeRequest | SplitterTreeRequest | RingsOnBusRequest;
