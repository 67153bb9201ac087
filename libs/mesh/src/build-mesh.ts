/** Builds the gate, vertex, corner-link, site and port tables of a mesh from its definition. */
import { type Axial, AXIAL_OFFSETS } from './axial.js';
import type { MeshDefinition, TechnologyProfile } from './mesh-definition.js';
import { MeshError } from './mesh-error.js';
import { cellId, cornerVertex, gateId, portId, vertexId, type GateDirection } from './mesh-ids.js';
import { gatePortIndex, type BoundarySite, type ExternalPort, type LinkKind, type Mesh, type MeshCell, type MeshGate, type MeshVertex } from './mesh.js';
import { shapeCells } from './shape-cells.js';

const DIRS: readonly GateDirection[] = ['e', 'ne', 'nw'];
const key = (c: Axial) => `${c.q},${c.r}`;

function checkTechnology(t: TechnologyProfile): void {
  const positive: [string, number][] = [
    ['unitLengthUm', t.unitLengthUm],
    ['groupIndex', t.groupIndex],
    ['referenceFrequencyHz', t.referenceFrequencyHz],
    ['phaseShifter.piPowerW', t.phaseShifter.piPowerW],
    ['phaseShifter.resistanceOhm', t.phaseShifter.resistanceOhm],
    ['phaseShifter.maxPowerW', t.phaseShifter.maxPowerW],
    ['phaseShifter.maxVoltageV', t.phaseShifter.maxVoltageV],
  ];
  for (const [name, v] of positive)
    if (!(Number.isFinite(v) && v > 0)) throw new MeshError('invalid-technology', `technology.${name} = ${v} must be a positive number`);
  for (const [name, v] of [['lossPerGateDb', t.lossPerGateDb], ['bendLossDb', t.bendLossDb], ['extinctionDb', t.extinctionDb]] as const)
    if (!(Number.isFinite(v) && v >= 0)) throw new MeshError('invalid-technology', `technology.${name} = ${v} must be a number >= 0`);
}

/** Builds a {@link Mesh}; throws MeshError naming the bad value (unknown site, port, dead gate). */
export function buildMesh(definition: MeshDefinition): Mesh {
  checkTechnology(definition.technology);
  const cellList = shapeCells(definition.shape);
  const cells: MeshCell[] = cellList.map((c, index) => ({ index, id: cellId(c), q: c.q, r: c.r }));
  const byPos = new Map(cellList.map((c, i) => [key(c), i]));
  const vertexIds: string[] = [];
  const vertexIndex = new Map<string, number>();
  const vertexGates: number[][] = [];
  const vertexOf = (c: Axial, corner: number): number => {
    const cv = cornerVertex(c, corner);
    const id = vertexId(cv.cell, cv.corner);
    let i = vertexIndex.get(id);
    if (i === undefined) {
      i = vertexIds.length;
      vertexIds.push(id);
      vertexIndex.set(id, i);
      vertexGates.push([]);
    }
    return i;
  };
  const dead = new Set(definition.deadGates);
  const gateLoss = definition.gateLossDb ?? {};
  const gates: MeshGate[] = [];
  const gateIndex = new Map<string, number>();
  for (const c of cellList) {
    for (let d = 0; d < 6; d++) {
      const o = AXIAL_OFFSETS[d]!;
      const anchor = d < 3 ? c : { q: c.q + o.q, r: c.r + o.r };
      const dir = d % 3;
      const id = gateId(anchor, DIRS[dir]!);
      if (gateIndex.has(id)) continue;
      const no = AXIAL_OFFSETS[dir]!;
      const sideCells: [number, number] = [byPos.get(key(anchor)) ?? -1, byPos.get(key({ q: anchor.q + no.q, r: anchor.r + no.r })) ?? -1];
      const ends: [number, number] = [vertexOf(anchor, dir - 1), vertexOf(anchor, dir)];
      const index = gates.length;
      gateIndex.set(id, index);
      vertexGates[ends[0]]!.push(index);
      vertexGates[ends[1]]!.push(index);
      gates.push({ index, id, anchor, direction: dir, sideCells, ends, dead: dead.has(id), lossDb: gateLoss[id] ?? definition.technology.lossPerGateDb });
    }
  }
  for (const g of definition.deadGates) if (!gateIndex.has(g)) throw new MeshError('unknown-gate', `dead gate ${g} is not a gate of this mesh`);
  for (const g of Object.keys(gateLoss)) if (!gateIndex.has(g)) throw new MeshError('unknown-gate', `gateLossDb names ${g}, which is not a gate of this mesh`);

  const nPorts = gates.length * 4;
  const link = new Int32Array(nPorts).fill(-1);
  const linkKind: LinkKind[] = new Array<LinkKind>(nPorts).fill('none');
  const portAt = new Int32Array(nPorts).fill(-1);
  const endAt = (g: MeshGate, v: number) => (g.ends[0] === v ? 0 : 1);
  const join = (p: number, q: number, kind: LinkKind) => {
    link[p] = q;
    link[q] = p;
    linkKind[p] = kind;
    linkKind[q] = kind;
  };
  // Corner links: inside cell c, edge i meets edge i+1 at corner i, on c's side of both gates.
  for (const c of cells) {
    const edgeGate = (d: number) => {
      const o = AXIAL_OFFSETS[d]!;
      const anchor = d < 3 ? c : { q: c.q + o.q, r: c.r + o.r };
      return gates[gateIndex.get(gateId(anchor, DIRS[d % 3]!))!]!;
    };
    for (let i = 0; i < 6; i++) {
      const v = vertexOf(c, i);
      const g1 = edgeGate(i);
      const g2 = edgeGate((i + 1) % 6);
      join(gatePortIndex(g1.index, i < 3 ? 0 : 1, endAt(g1, v)), gatePortIndex(g2.index, (i + 1) % 6 < 3 ? 0 : 1, endAt(g2, v)), 'corner');
    }
  }
  const io = new Set(definition.ioSites);
  const sites: BoundarySite[] = [];
  const ports: ExternalPort[] = [];
  const specs = new Map(definition.ports.map((p) => [p.id, p]));
  const vertices: MeshVertex[] = vertexIds.map((id, index) => {
    const gs = vertexGates[index]!;
    const outer = gs.filter((g) => gates[g]!.sideCells.includes(-1));
    return { index, id, gates: gs, boundary: outer.length > 0 };
  });
  const order = vertices.map((v) => v.index).sort((x, y) => (vertexIds[x]! < vertexIds[y]! ? -1 : 1));
  for (const vi of order) {
    const v = vertices[vi]!;
    if (!v.boundary) continue;
    const outer = v.gates.filter((g) => gates[g]!.sideCells.includes(-1)).sort((x, y) => (gates[x]!.id < gates[y]!.id ? -1 : 1));
    const gp = outer.map((g) => gatePortIndex(g, gates[g]!.sideCells[0] === -1 ? 0 : 1, endAt(gates[g]!, vi)));
    const pair: [number, number] = [gp[0]!, gp[1]!];
    const kind = io.has(v.id) ? 'io' : 'bend';
    sites.push({ vertex: v.id, kind, gatePorts: pair });
    if (kind === 'bend') join(pair[0], pair[1], 'bend');
    else
      pair.forEach((p, k) => {
        const g = gates[outer[k]!]!;
        const id = portId(v.id, g.id);
        const spec = specs.get(id);
        portAt[p] = ports.length;
        linkKind[p] = 'external';
        ports.push({ index: ports.length, id, site: v.id, gate: g.id, gatePort: p, wiredTo: spec?.wiredTo ?? 'none', label: spec?.label });
      });
  }
  for (const s of definition.ioSites) {
    const vi = vertexIndex.get(s);
    if (vi === undefined || !vertices[vi]!.boundary) throw new MeshError('unknown-site', `I/O site ${s} is not a boundary vertex of this mesh`);
  }
  const portIndex = new Map<string, number>();
  for (const p of ports) portIndex.set(p.id, p.index);
  for (const spec of definition.ports) {
    if (!portIndex.has(spec.id)) throw new MeshError('unknown-port', `port ${spec.id} is not a port of an I/O site of this mesh`);
    if (spec.label !== undefined) {
      if (portIndex.has(spec.label)) throw new MeshError('invalid-id', `port label "${spec.label}" is used twice or equals a port id`);
      portIndex.set(spec.label, portIndex.get(spec.id)!);
    }
  }
  return { definition, cells, gates, vertices, sites, ports, link, linkKind, portAt, cellIndex: new Map(cells.map((c) => [c.id, c.index])), gateIndex, vertexIndex, portIndex };
}
