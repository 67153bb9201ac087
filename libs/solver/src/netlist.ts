/** The mesh-independent netlist: directed 2x2 stages of one unit delay each, their links and ports. */
import type { Transfer2x2 } from './gate-transfer.js';
import { SolverInputError } from './unit-delay.js';

/** One end of a stage: its waveguide slot 0 (side a) or 1 (side b). */
export type StageSlot = { stage: string; slot: 0 | 1 };

/** A directed 2x2 stage: one traversal of one gate in one direction, one unit delay. */
export type StageSpec = { id: string; transfer: Transfer2x2 };

/** A netlist written by hand or by an adapter, with readable ids. */
export type NetlistSpec = {
  stages: readonly StageSpec[];
  /** Output slot of one stage feeding an input slot of another (corner link or boundary bend, no extra delay). */
  links: readonly { from: StageSlot; to: StageSlot }[];
  /** External input ports, each feeding one input slot. */
  inputs: readonly { port: string; to: StageSlot }[];
  /** External output ports, each fed by one output slot. Output slots left unconnected absorb their light. */
  outputs: readonly { port: string; from: StageSlot }[];
};

/**
 * A compiled netlist in flat arrays (what the solvers run on).
 * Slot k = 2 * stage + side; `target[k]` is the input slot fed by output slot k, `-1 - p` for output port p,
 * or `OPEN_END` when the light there leaves the model (absorbed).
 */
export type Netlist = {
  stageCount: number;
  stageIds: readonly string[];
  /** 8 numbers per stage, see {@link Transfer2x2}. */
  transfers: Float64Array;
  target: Int32Array;
  inputPorts: readonly string[];
  /** Input slot fed by each input port, same order as `inputPorts`. */
  inputSlots: Int32Array;
  outputPorts: readonly string[];
};

/** Value of `Netlist.target` for an output slot that is connected to nothing. */
export const OPEN_END = -0x7fffffff;

/** Error for a netlist that does not describe a valid circuit (duplicate id, slot used twice, unknown stage). */
export class NetlistError extends Error {
  override readonly name = 'NetlistError';
}

/** Checks a netlist spec once and turns it into flat arrays; ids stay available for reports. */
export function compileNetlist(spec: NetlistSpec): Netlist {
  const index = new Map<string, number>();
  const transfers = new Float64Array(spec.stages.length * 8);
  spec.stages.forEach((stage, i) => {
    if (index.has(stage.id)) throw new NetlistError(`netlist: duplicate stage id "${stage.id}"`);
    if (stage.transfer.length !== 8) throw new NetlistError(`netlist: stage "${stage.id}" transfer must have 8 numbers, got ${stage.transfer.length}`);
    if (!stage.transfer.every(Number.isFinite)) throw new NetlistError(`netlist: stage "${stage.id}" transfer has a non-finite number`);
    index.set(stage.id, i);
    transfers.set(stage.transfer, i * 8);
  });
  const slotOf = (s: StageSlot, what: string): number => {
    const i = index.get(s.stage);
    if (i === undefined) throw new NetlistError(`netlist: ${what} names unknown stage "${s.stage}"`);
    if (s.slot !== 0 && s.slot !== 1) throw new NetlistError(`netlist: ${what} slot must be 0 or 1, got ${String(s.slot)}`);
    return 2 * i + s.slot;
  };
  const target = new Int32Array(spec.stages.length * 2).fill(OPEN_END);
  const fed = new Uint8Array(spec.stages.length * 2);
  const claimOut = (k: number, value: number, what: string): void => {
    if (target[k] !== OPEN_END) throw new NetlistError(`netlist: output slot ${describe(spec, k)} is used twice (${what})`);
    target[k] = value;
  };
  const claimIn = (k: number, what: string): void => {
    if (fed[k]) throw new NetlistError(`netlist: input slot ${describe(spec, k)} is fed twice (${what})`);
    fed[k] = 1;
  };
  for (const link of spec.links) {
    const from = slotOf(link.from, 'a link');
    const to = slotOf(link.to, 'a link');
    claimIn(to, 'link');
    claimOut(from, to, 'link');
  }
  const inputPorts: string[] = [];
  const inputSlots = new Int32Array(spec.inputs.length);
  spec.inputs.forEach((input, p) => {
    if (inputPorts.includes(input.port)) throw new NetlistError(`netlist: duplicate input port "${input.port}"`);
    const to = slotOf(input.to, `input port "${input.port}"`);
    claimIn(to, `input port "${input.port}"`);
    inputPorts.push(input.port);
    inputSlots[p] = to;
  });
  const outputPorts: string[] = [];
  spec.outputs.forEach((output, p) => {
    if (outputPorts.includes(output.port)) throw new NetlistError(`netlist: duplicate output port "${output.port}"`);
    claimOut(slotOf(output.from, `output port "${output.port}"`), -1 - p, `output port "${output.port}"`);
    outputPorts.push(output.port);
  });
  return {
    stageCount: spec.stages.length,
    stageIds: spec.stages.map((s) => s.id),
    transfers,
    target,
    inputPorts,
    inputSlots,
    outputPorts,
  };
}

function describe(spec: NetlistSpec, k: number): string {
  return `${spec.stages[k >> 1]?.id ?? '?'}#${k & 1}`;
}

/** Index of a named input port, or a {@link SolverInputError} listing the known ones. */
export function inputPortIndex(netlist: Netlist, port: string): number {
  const i = netlist.inputPorts.indexOf(port);
  if (i < 0) throw new SolverInputError(`solver: unknown input port "${port}" (known: ${netlist.inputPorts.join(', ') || 'none'})`);
  return i;
}

/** Index of a named output port, or a {@link SolverInputError} listing the known ones. */
export function outputPortIndex(netlist: Netlist, port: string): number {
  const i = netlist.outputPorts.indexOf(port);
  if (i < 0) throw new SolverInputError(`solver: unknown output port "${port}" (known: ${netlist.outputPorts.join(', ') || 'none'})`);
  return i;
}
