// Hand-built netlists shared by the solver tests: a single-cell all-pass ring, an add-drop ring, an MZI.
import { compileNetlist, couplerTransfer, gateTransfer, thetaForKappa, type GateEnd, type GateNetwork, type Netlist, type NetlistSpec, type StageSpec } from '../src/index.js';

/** A bar-only unit (one waveguide carries, the other is unused), amplitude from loss. */
export function barStage(id: string, lossDb: number): StageSpec {
  return { id, transfer: couplerTransfer(0, lossDb) };
}

/** All-pass ring of `units` stages: stage "c" couples the bus (slot 1) to the ring (slot 0). */
export function allPassRing(kappa: number, lossDb: number, units = 6): Netlist {
  const stages: StageSpec[] = [{ id: 'c', transfer: couplerTransfer(kappa, lossDb) }];
  const links: NetlistSpec['links'][number][] = [];
  let prev = 'c';
  for (let i = 1; i < units; i++) {
    stages.push(barStage(`r${i}`, lossDb));
    links.push({ from: { stage: prev, slot: 0 }, to: { stage: `r${i}`, slot: 0 } });
    prev = `r${i}`;
  }
  links.push({ from: { stage: prev, slot: 0 }, to: { stage: 'c', slot: 0 } });
  return compileNetlist({
    stages,
    links,
    inputs: [{ port: 'in', to: { stage: 'c', slot: 1 } }],
    outputs: [{ port: 'out', from: { stage: 'c', slot: 1 } }],
  });
}

/** Add-drop ring of six units: couplers "c1" (bus in/through) and "c2" (add/drop) three units apart. */
export function addDropRing(kappa1: number, kappa2: number, lossDb: number): Netlist {
  const ids = ['c1', 'r1', 'r2', 'c2', 'r3', 'r4'];
  const stages = ids.map((id) =>
    id === 'c1' ? { id, transfer: couplerTransfer(kappa1, lossDb) } : id === 'c2' ? { id, transfer: couplerTransfer(kappa2, lossDb) } : barStage(id, lossDb),
  );
  const links = ids.map((id, i) => ({ from: { stage: id, slot: 0 as const }, to: { stage: ids[(i + 1) % 6] as string, slot: 0 as const } }));
  return compileNetlist({
    stages,
    links,
    inputs: [
      { port: 'in', to: { stage: 'c1', slot: 1 } },
      { port: 'add', to: { stage: 'c2', slot: 1 } },
    ],
    outputs: [
      { port: 'through', from: { stage: 'c1', slot: 1 } },
      { port: 'drop', from: { stage: 'c2', slot: 1 } },
    ],
  });
}

/** MZI: 3 dB splitter, arms of `longUnits` and `shortUnits` bar stages, 3 dB combiner; ports in, bar, cross. */
export function mzi(longUnits: number, shortUnits: number, lossDb: number): Netlist {
  const stages: StageSpec[] = [
    { id: 's', transfer: couplerTransfer(0.5, lossDb) },
    { id: 'm', transfer: couplerTransfer(0.5, lossDb) },
  ];
  const links: NetlistSpec['links'][number][] = [];
  for (const [arm, count] of [[0, longUnits], [1, shortUnits]] as const) {
    let prev: { stage: string; slot: 0 | 1 } = { stage: 's', slot: arm };
    for (let i = 0; i < count; i++) {
      const id = `a${arm}-${i}`;
      stages.push(barStage(id, lossDb));
      links.push({ from: prev, to: { stage: id, slot: 0 } });
      prev = { stage: id, slot: 0 };
    }
    links.push({ from: prev, to: { stage: 'm', slot: arm } });
  }
  return compileNetlist({
    stages,
    links,
    inputs: [{ port: 'in', to: { stage: 's', slot: 0 } }],
    outputs: [
      { port: 'bar', from: { stage: 'm', slot: 0 } },
      { port: 'cross', from: { stage: 'm', slot: 1 } },
    ],
  });
}

/**
 * A reciprocal four-port chip of six gates in a loop (two concentric waveguide rings broken at one joint),
 * every gate a non-ideal MZI with the given phases: a small stand-in for a mesh, with ports a0, a1, b0, b1.
 */
export function gateLoop(lossDb: number, extinctionDb: number, thetas = [0.3, 1.1, 2.0, 2.9, 0.7, 1.6]): GateNetwork {
  const gates = thetas.map((thetaRad, i) => ({ id: `g${i}`, transfer: gateTransfer({ thetaRad, phiRad: 0.4 * i, lossDb, extinctionDb }) }));
  const joins: [GateEnd, GateEnd][] = [];
  for (let i = 0; i + 1 < gates.length; i++) {
    for (const w of [0, 1] as const) joins.push([{ gate: `g${i}`, waveguide: w, end: 1 }, { gate: `g${i + 1}`, waveguide: w, end: 0 }]);
  }
  return {
    gates,
    joins,
    ports: [
      { port: 'a0', at: { gate: 'g0', waveguide: 0, end: 0 } },
      { port: 'a1', at: { gate: 'g0', waveguide: 1, end: 0 } },
      { port: 'b0', at: { gate: 'g5', waveguide: 0, end: 1 } },
      { port: 'b1', at: { gate: 'g5', waveguide: 1, end: 1 } },
    ],
  };
}

/** Two single-cell rings side by side sharing gate "k" (coupled rings), with a bus at "c"; ports in, out. */
export function coupledRings(lossDb: number, extinctionDb: number): GateNetwork {
  const t = (thetaRad: number): Float64Array => gateTransfer({ thetaRad, phiRad: 0, lossDb, extinctionDb });
  const BAR = Math.PI, SPLIT = thetaForKappa(0.2);
  const ids = ['c', 'p1', 'p2', 'k', 'p3', 'p4', 'q1', 'q2', 'q3', 'q4', 'q5'];
  const gates = ids.map((id) => ({ id, transfer: t(id === 'c' ? SPLIT : id === 'k' ? thetaForKappa(0.05) : BAR) }));
  const j = (g1: string, w1: 0 | 1, g2: string, w2: 0 | 1): [GateEnd, GateEnd] => [{ gate: g1, waveguide: w1, end: 1 }, { gate: g2, waveguide: w2, end: 0 }];
  // Ring 1 on waveguide 0 of c, p1, p2, k, p3, p4; ring 2 on waveguide 1 of k and waveguide 0 of q1..q5.
  const joins = [j('c', 0, 'p1', 0), j('p1', 0, 'p2', 0), j('p2', 0, 'k', 0), j('k', 0, 'p3', 0), j('p3', 0, 'p4', 0), [{ gate: 'p4', waveguide: 0, end: 1 }, { gate: 'c', waveguide: 0, end: 0 }] as [GateEnd, GateEnd],
    j('k', 1, 'q1', 0), j('q1', 0, 'q2', 0), j('q2', 0, 'q3', 0), j('q3', 0, 'q4', 0), j('q4', 0, 'q5', 0), [{ gate: 'q5', waveguide: 0, end: 1 }, { gate: 'k', waveguide: 1, end: 0 }] as [GateEnd, GateEnd]];
  return {
    gates,
    joins,
    ports: [
      { port: 'in', at: { gate: 'c', waveguide: 1, end: 0 } },
      { port: 'out', at: { gate: 'c', waveguide: 1, end: 1 } },
    ],
  };
}
