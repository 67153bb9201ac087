/** Adapter from a libs/mesh mesh + configuration to the solver's gate network: every gate of the chip. */
import { gateKappa, type Configuration, type GateSetting, type Mesh } from '@hexloom/mesh';
import type { GateEnd, GateNetwork } from './gate-network.js';
import { compileGateNetwork } from './gate-network.js';
import type { GatePerturbation } from './gate-transfer.js';
import { gateTransfer, thetaForKappa, transposeTransfer } from './gate-transfer.js';
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
  /**
   * The same chip with other per-gate errors on the named gates (replacing any given when it was built), without
   * rebuilding the netlist: only those gates' stages are recomputed (for Monte Carlo runs).
   */
  withPerturbations: (perturbations: Readonly<Record<string, GatePerturbation>>) => Netlist;
};

/**
 * Copies the netlist with new transfers for some gates. Gate i owns stages 2i (end 0 -> 1) and 2i + 1 (back,
 * transposed); a boundary bend scales the rows of the stage that feeds it, which the compiled transfer already
 * carries, so each row keeps the ratio of compiled to unscaled magnitude.
 */
function patchGates(netlist: Netlist, gates: readonly { id: string; transfer: Float64Array }[], mesh: Mesh, transferOf: (i: number) => Float64Array, ids: readonly string[]): Netlist {
  const transfers = Float64Array.from(netlist.transfers);
  for (const id of ids) {
    const i = mesh.gateIndex.get(id);
    if (i === undefined) throw new NetlistError(`netlist: perturbation names gate ${id}, which is not a gate of this mesh`);
    const base = gates[i]!.transfer;
    const next = transferOf(i);
    [next, transposeTransfer(next)].forEach((t, direction) => {
      const baseT = direction === 0 ? base : transposeTransfer(base);
      const offset = 8 * (2 * i + direction);
      for (const row of [0, 1]) {
        const k = 4 * row;
        const unscaled = Math.hypot(baseT[k]!, baseT[k + 1]!, baseT[k + 2]!, baseT[k + 3]!);
        const compiled = Math.hypot(transfers[offset + k]!, transfers[offset + k + 1]!, transfers[offset + k + 2]!, transfers[offset + k + 3]!);
        const scale = unscaled > 0 ? compiled / unscaled : 1;
        for (let c = 0; c < 4; c++) transfers[offset + k + c] = t[k + c]! * scale;
      }
    });
  }
  return { ...netlist, transfers };
}

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
  const transferOf = (g: Mesh['gates'][number], perturbation: GatePerturbation | undefined) => {
    const setting = settings.get(g.id);
    const kappa = gateKappa(setting && !g.dead ? setting : { state: configuration.parkedState });
    return gateTransfer({
      thetaRad: thetaForKappa(kappa),
      phiRad: setting?.phaseRad ?? 0,
      lossDb: g.lossDb,
      extinctionDb: tech.extinctionDb,
      ...perturbation,
    });
  };
  const gates = mesh.gates.map((g) => ({ id: g.id, transfer: transferOf(g, perturbations[g.id]) }));
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
  const netlist = compileGateNetwork(network);
  return {
    netlist,
    network,
    withPerturbations: (extra) => patchGates(netlist, gates, mesh, (i) => transferOf(mesh.gates[i]!, extra[mesh.gates[i]!.id]), Object.keys(extra)),
    unitDelayS: unitDelayS({ unitLengthUm: tech.unitLengthUm, groupIndex: tech.groupIndex }),
    referenceFrequencyHz: tech.referenceFrequencyHz,
    portIdOf,
  };
}
