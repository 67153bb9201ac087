/** Physical level above the netlist: gates with two waveguides and two ends, joined end to end, both directions. */
import type { Transfer2x2 } from './gate-transfer.js';
import { transposeTransfer } from './gate-transfer.js';
import type { Netlist, NetlistSpec, StageSlot } from './netlist.js';
import { compileNetlist, NetlistError } from './netlist.js';

/** One end of one waveguide of one gate: waveguide 0 (side a) or 1 (side b), end 0 or 1. */
export type GateEnd = { gate: string; waveguide: 0 | 1; end: 0 | 1 };

/** A reciprocal chip: gates (transfer for travel from end 0 to end 1), joins between ends, and ports at ends. */
export type GateNetwork = {
  gates: readonly { id: string; transfer: Transfer2x2 }[];
  /** Corner links and boundary bends: light leaving one end enters the other, both ways, no extra delay. */
  joins: readonly (readonly [GateEnd, GateEnd])[];
  /** Extra loss of a join (boundary bend), dB, by index into `joins`; joins not listed are lossless. */
  joinLossDb?: Readonly<Record<number, number>>;
  /** External ports: each is an input (light enters at that end) and an output (light leaves there). */
  ports: readonly { port: string; at: GateEnd }[];
};

/** Stage id of a gate travelled from end 0 to end 1 (`>`) or back (`<`). */
export function stageIdOf(gate: string, direction: 'forward' | 'reverse'): string {
  return `${gate}${direction === 'forward' ? '>' : '<'}`;
}

/** Light leaving the gate at this end comes out of the stage travelling towards it. */
function leaving(e: GateEnd): StageSlot {
  return { stage: stageIdOf(e.gate, e.end === 1 ? 'forward' : 'reverse'), slot: e.waveguide };
}

/** Light entering the gate at this end goes into the stage travelling away from it. */
function entering(e: GateEnd): StageSlot {
  return { stage: stageIdOf(e.gate, e.end === 0 ? 'forward' : 'reverse'), slot: e.waveguide };
}

/**
 * Expands a gate network into a directed netlist: two stages per gate (the reverse one with the transposed
 * transfer, by reciprocity), two links per join, and one input and one output per port.
 * Ends that are neither joined nor ports absorb what reaches them.
 */
export function compileGateNetwork(network: GateNetwork): Netlist {
  const used = new Set<string>();
  const key = (e: GateEnd): string => `${e.gate}/${e.waveguide}/${e.end}`;
  const claim = (e: GateEnd, what: string): void => {
    if (used.has(key(e))) throw new NetlistError(`netlist: gate end ${key(e)} is used twice (${what})`);
    used.add(key(e));
  };
  // A lossy join scales the output row of the stage that feeds it (each output slot feeds one join).
  const rowScale = new Map<string, number>();
  network.joins.forEach(([p, q], i) => {
    const lossDb = network.joinLossDb?.[i] ?? 0;
    if (!(Number.isFinite(lossDb) && lossDb >= 0)) throw new NetlistError(`netlist: join ${i} loss must be >= 0 dB, got ${lossDb}`);
    if (lossDb > 0) for (const e of [p, q]) rowScale.set(key(e), 10 ** (-lossDb / 20));
  });
  const scaled = (t: Transfer2x2, gate: string, leavingEnd: 0 | 1): Transfer2x2 => {
    const out = Float64Array.from(t);
    for (const w of [0, 1] as const) {
      const a = rowScale.get(key({ gate, waveguide: w, end: leavingEnd }));
      if (a !== undefined) for (let k = 4 * w; k < 4 * w + 4; k++) out[k] = (out[k] ?? 0) * a;
    }
    return out;
  };
  const stages: NetlistSpec['stages'][number][] = [];
  for (const g of network.gates) {
    stages.push({ id: stageIdOf(g.id, 'forward'), transfer: scaled(g.transfer, g.id, 1) });
    stages.push({ id: stageIdOf(g.id, 'reverse'), transfer: scaled(transposeTransfer(g.transfer), g.id, 0) });
  }
  const links: NetlistSpec['links'][number][] = [];
  for (const [p, q] of network.joins) {
    claim(p, 'join');
    claim(q, 'join');
    links.push({ from: leaving(p), to: entering(q) }, { from: leaving(q), to: entering(p) });
  }
  for (const port of network.ports) claim(port.at, `port "${port.port}"`);
  return compileNetlist({
    stages,
    links,
    inputs: network.ports.map((p) => ({ port: p.port, to: entering(p.at) })),
    outputs: network.ports.map((p) => ({ port: p.port, from: leaving(p.at) })),
  });
}
