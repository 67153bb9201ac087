/** Reference route: dense solve of (I - z^-1 A) x = B at each frequency with mathjs, for small chips. */
import { complex, lusolve, type Complex, type MathArray } from 'mathjs';
import type { Netlist } from './netlist.js';
import { inputPortIndex, OPEN_END } from './netlist.js';
import { SolverInputError } from './unit-delay.js';

/** Largest state (2 x stages) the dense route accepts: a radius-2 block has 72 gates, 288 slots. */
export const REFERENCE_MAX_SLOTS = 320;

/** H at every output port (same order as `Netlist.outputPorts`), per frequency: `re[q][i]`, `im[q][i]`. */
export type ReferenceResponse = { re: Float64Array[]; im: Float64Array[] };

/**
 * State x = field entering every input slot; A maps it through the stage transfers and links to the next
 * step, B launches the input port, C collects the output ports. Then
 * H(z) = z^-1 C (I - z^-1 A)^-1 B with z^-1 = e^{-j 2 pi (f - f0) T_u} (state-space form of a
 * discrete-time system, common practice), solved by LU (mathjs `lusolve`) at each frequency.
 */
export function referenceResponse(netlist: Netlist, inputPort: string, offsetsHz: Float64Array, unitDelayS: number): ReferenceResponse {
  const p = inputPortIndex(netlist, inputPort);
  const n = netlist.stageCount * 2;
  if (n > REFERENCE_MAX_SLOTS) {
    throw new SolverInputError(`solver: the dense reference route takes at most ${REFERENCE_MAX_SLOTS} slots, this netlist has ${n}`);
  }
  const a: { row: number; col: number; re: number; im: number }[] = [];
  const c: { port: number; col: number; re: number; im: number }[] = [];
  for (let k = 0; k < n; k++) {
    const s = k >> 1, side = k & 1;
    for (let j = 0; j < 2; j++) {
      const o = 8 * s + 4 * side + 2 * j;
      const re = netlist.transfers[o] ?? 0, im = netlist.transfers[o + 1] ?? 0;
      if (re === 0 && im === 0) continue;
      const dest = netlist.target[k] ?? -1;
      if (dest >= 0) a.push({ row: dest, col: 2 * s + j, re, im });
      else if (dest !== OPEN_END) c.push({ port: -1 - dest, col: 2 * s + j, re, im });
    }
  }
  const outCount = netlist.outputPorts.length;
  const result: ReferenceResponse = {
    re: Array.from({ length: outCount }, () => new Float64Array(offsetsHz.length)),
    im: Array.from({ length: outCount }, () => new Float64Array(offsetsHz.length)),
  };
  const b: Complex[][] = Array.from({ length: n }, (_, k) => [complex(k === netlist.inputSlots[p] ? 1 : 0, 0)]);
  offsetsHz.forEach((f, i) => {
    const w = 2 * Math.PI * f * unitDelayS;
    const zr = Math.cos(w), zi = -Math.sin(w);
    const m: number[][][] = Array.from({ length: n }, (_, r) => Array.from({ length: n }, (_, q) => [r === q ? 1 : 0, 0]));
    for (const e of a) {
      const cell = (m[e.row] as number[][])[e.col] as number[];
      cell[0] = (cell[0] ?? 0) - (zr * e.re - zi * e.im);
      cell[1] = (cell[1] ?? 0) - (zr * e.im + zi * e.re);
    }
    const matrix = m.map((row) => row.map(([re, im]) => complex(re ?? 0, im ?? 0)));
    const x = (lusolve(matrix as unknown as MathArray, b as unknown as MathArray) as unknown as Complex[][]).map((row) => row[0] as Complex);
    for (const e of c) {
      const xv = complex(x[e.col] as Complex); // lusolve may hand back a plain number for a real entry
      const yr = e.re * xv.re - e.im * xv.im, yi = e.re * xv.im + e.im * xv.re;
      (result.re[e.port] as Float64Array)[i] = ((result.re[e.port] as Float64Array)[i] ?? 0) + zr * yr - zi * yi;
      (result.im[e.port] as Float64Array)[i] = ((result.im[e.port] as Float64Array)[i] ?? 0) + zr * yi + zi * yr;
    }
  });
  return result;
}
