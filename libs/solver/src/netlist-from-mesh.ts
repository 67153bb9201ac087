/** Adapter from a libs/mesh mesh + configuration to the solver's gate network: every gate of the chip. */
import { gateKappa, type Configuration, type GateSetting, type Mesh } from '@hexloom/mesh';
import type { GateEnd, GateNetwork } from './gate-network.js';
import { compileGateNetwork } from './gate-network.js';
import type { GatePerturbation } from './gate-transfer.js';
import { gateTransfer, thetaForKappa } from './gate-transfer.js';
import type { Netlist } from './netlist.js';
import { NetlistError } from './netlist.js';
import { unitDelayS } from './unit-delay.js';

export type MeshNetlistInput = {
  mesh: Mesh;
  configuration: Configuration;
  /** Per-gate errors by gate id (for tolerance and Monte Carlo studies, seeded by the caller). */
  perturbations?: Readonly<Record<string, GatePerturbation>>;
};

/** A compiled chip with the figures every response needs. */
export type MeshNetlist = {
  netlist: Netlist;
  network: GateNetwork;
  unitDelayS: number;
  referenceFrequencyHz: number;
  /** Port names of the netlist are mesh port ids; labels map here to ids. */
  portIdOf: ReadonlyMap<string, string>;
};

/**
 * Every gate of the mesh becomes a gate of the network: configured gates in their state (bar, cross or
 * split kappa, outer phase), idle and dead gates parked in `configuration.parkedState`, all with the
 * technology's extinction and the gate's own loss, so leakage through idle gates is simulated.
 * Corner links join gate ends losslessly (the corner bend is part of the unit); boundary bends add
 * `technology.bendLossDb`; every external port of an I/O site is a port of the network.
 */
export function netlistFromMesh({ mesh, configuration, perturbations = {} }: MeshNetlistInput): MeshNetlist {
  const tech = mesh.definition.technology;
  const settings = new Map<string, GateSetting>();
  for (const s of configuration.gates) {
    if (!mesh.gateIndex.has(s.gate)) throw new NetlistError(`netlist: configuration sets gate ${s.gate}, which is not a gate of this mesh`);
    settings.set(s.gate, s);
  }
  for (const id of Object.keys(perturbations)) {
    if (!mesh.gateIndex.has(id)) throw new NetlistError(`netlist: perturbation names gate ${id}, which is not a gate of this mesh`);
  }
  const gates = mesh.gates.map((g) => {
    const setting = settings.get(g.id);
    const kappa = gateKappa(setting && !g.dead ? setting : { state: configuration.parkedState });
    const transfer = gateTransfer({
      thetaRad: thetaForKappa(kappa),
      phiRad: setting?.phaseRad ?? 0,
      lossDb: g.lossDb,
      extinctionDb: tech.extinctionDb,
      ...perturbations[g.id],
    });
    return { id: g.id, transfer };
  });
  const endOf = (p: number): GateEnd => {
    const gate = mesh.gates[p >> 2];
    if (!gate) throw new NetlistError(`netlist: gate port ${p} is outside the mesh`);
    return { gate: gate.id, waveguide: ((p >> 1) & 1) as 0 | 1, end: (p & 1) as 0 | 1 };
  };
  const joins: [GateEnd, GateEnd][] = [];
  const joinLossDb: Record<number, number> = {};
  for (let p = 0; p < mesh.link.length; p++) {
    const q = mesh.link[p] ?? -1;
    if (q < 0 || q < p) continue;
    if (mesh.link[q] !== p) throw new NetlistError(`netlist: mesh link ${p} -> ${q} is not symmetric`);
    if (mesh.linkKind[p] === 'bend' && tech.bendLossDb > 0) joinLossDb[joins.length] = tech.bendLossDb;
    joins.push([endOf(p), endOf(q)]);
  }
  const ports = mesh.ports.map((port) => ({ port: port.id, at: endOf(port.gatePort) }));
  const network: GateNetwork = { gates, joins, joinLossDb, ports };
  const portIdOf = new Map<string, string>();
  for (const [name, index] of mesh.portIndex) {
    const port = mesh.ports[index];
    if (port) portIdOf.set(name, port.id);
  }
  return {
    netlist: compileGateNetwork(network),
    network,
    unitDelayS: unitDelayS({ unitLengthUm: tech.unitLengthUm, groupIndex: tech.groupIndex }),
    referenceFrequencyHz: tech.referenceFrequencyHz,
    portIdOf,
  };
}
