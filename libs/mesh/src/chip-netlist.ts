/** The solver's view of a configured chip: gates with couplings, directed waveguide segments, links and ports. */
import type { Configuration } from './configuration.js';
import { gateKappa, type GateState } from './gate-state.js';
import type { Mesh } from './mesh.js';

/** A gate as the solver sees it: power cross-coupling kappa, outer phase, loss. */
export type NetlistGate = {
  readonly index: number;
  readonly id: string;
  readonly state: GateState;
  readonly kappa: number;
  readonly phaseRad: number;
  readonly lossDb: number;
  readonly dead: boolean;
  readonly circuit: string | undefined;
};

/**
 * A directed waveguide segment: light on side `side` of gate `gate`, travelling from end
 * `fromEnd` to the other end (one unit of length and delay). Its index is `gate * 4 + side * 2 + fromEnd`,
 * the index of the gate port where it starts. Light entering gate g at end e (on either side)
 * is coupled into segments (g, 0, e) and (g, 1, e): bar keeps the side, cross swaps it.
 */
export type NetlistSegment = { readonly index: number; readonly gate: number; readonly side: 0 | 1; readonly fromEnd: 0 | 1 };

/** Two gate ports joined outside their gates: light leaving at one enters at the other (both ways). */
export type NetlistLink = { readonly kind: 'corner' | 'bend'; readonly a: number; readonly b: number; readonly lossDb: number };

/** An external port attached at gate port `gatePort`: light injected there enters the gate; light leaving there exits the chip. */
export type NetlistPort = { readonly index: number; readonly id: string; readonly label: string | undefined; readonly wiredTo: string; readonly gatePort: number };

export type ChipNetlist = {
  readonly gates: readonly NetlistGate[];
  readonly segments: readonly NetlistSegment[];
  readonly links: readonly NetlistLink[];
  readonly ports: readonly NetlistPort[];
  /** Unit delay T_u = n_g L_u / c, seconds. */
  readonly unitDelayS: number;
  readonly referenceFrequencyHz: number;
};

const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

/** Everything a frequency-domain solver needs to simulate `configuration` on `mesh` (idle gates parked). */
export function chipNetlist(mesh: Mesh, configuration: Configuration): ChipNetlist {
  const settings = new Map(configuration.gates.map((s) => [s.gate, s]));
  const gates: NetlistGate[] = mesh.gates.map((g) => {
    const s = settings.get(g.id);
    const state = s?.state ?? configuration.parkedState;
    return { index: g.index, id: g.id, state, kappa: gateKappa({ state, kappa: s?.kappa }), phaseRad: s?.phaseRad ?? 0, lossDb: g.lossDb, dead: g.dead, circuit: s?.circuit };
  });
  const segments: NetlistSegment[] = [];
  for (let p = 0; p < mesh.link.length; p++) segments.push({ index: p, gate: p >> 2, side: ((p >> 1) & 1) as 0 | 1, fromEnd: (p & 1) as 0 | 1 });
  const links: NetlistLink[] = [];
  for (let p = 0; p < mesh.link.length; p++) {
    const kind = mesh.linkKind[p];
    const q = mesh.link[p]!;
    if ((kind === 'corner' || kind === 'bend') && p < q) links.push({ kind, a: p, b: q, lossDb: kind === 'bend' ? mesh.definition.technology.bendLossDb : 0 });
  }
  const t = mesh.definition.technology;
  return {
    gates,
    segments,
    links,
    ports: mesh.ports.map((p) => ({ index: p.index, id: p.id, label: p.label, wiredTo: p.wiredTo, gatePort: p.gatePort })),
    unitDelayS: (t.groupIndex * t.unitLengthUm * 1e-6) / SPEED_OF_LIGHT_M_PER_S,
    referenceFrequencyHz: t.referenceFrequencyHz,
  };
}
