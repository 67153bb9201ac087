/** Where the launched light went, averaged over the unit FSR (Parseval on the impulse response). */
import type { ImpulseResponse } from './impulse-response.js';
import type { Netlist } from './netlist.js';
import { outputPortIndex } from './netlist.js';

/** Energy fractions of a unit impulse; they add up to 1. */
export type PowerBalance = {
  inputPort: string;
  /** Energy reaching each chosen output port. */
  chosen: Record<string, number>;
  /** Energy leaking to every other output port (unused ports), by port. */
  leakage: Record<string, number>;
  /** Energy absorbed in gates and bends (insertion loss) and at open ends. */
  lost: number;
  /** Energy still in the mesh when the impulse run stopped. */
  residual: number;
};

/**
 * By Parseval's theorem sum_n |h[n]|^2 is the mean of |H(f)|^2 over one unit FSR, so the energy at each
 * port is its band-averaged transmission (common practice); loss is what neither left nor stayed.
 */
export function powerBalance(netlist: Netlist, ir: ImpulseResponse, chosenPorts: readonly string[]): PowerBalance {
  const chosenIdx = new Set(chosenPorts.map((p) => outputPortIndex(netlist, p)));
  const chosen: Record<string, number> = {}, leakage: Record<string, number> = {};
  let out = 0;
  netlist.outputPorts.forEach((port, q) => {
    const h = ir.outputs[q];
    let e = 0;
    if (h) for (let n = 0; n < h.re.length; n++) e += (h.re[n] ?? 0) ** 2 + (h.im[n] ?? 0) ** 2;
    out += e;
    (chosenIdx.has(q) ? chosen : leakage)[port] = e;
  });
  return { inputPort: ir.inputPort, chosen, leakage, lost: Math.max(0, 1 - out - ir.residualEnergy), residual: ir.residualEnergy };
}
