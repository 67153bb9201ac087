// Hand-built netlists shared by the solver tests: a single-cell all-pass ring, an add-drop ring, an MZI.
import { compileNetlist, couplerTransfer, type Netlist, type NetlistSpec, type StageSpec } from '../src/index.js';

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
