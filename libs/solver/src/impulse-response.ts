/** Impulse response of a netlist in the unit-delay domain, on the sparse field of every directed waveguide. */
import type { Netlist } from './netlist.js';
import { inputPortIndex, OPEN_END } from './netlist.js';
import { SolverInputError } from './unit-delay.js';

/** Complex sequence h[n], n = 0 .. length - 1, in split real/imaginary arrays. */
export type ComplexSeries = { re: Float64Array; im: Float64Array };

export type ImpulseOptions = {
  /** Stop when the energy left in the mesh falls below this fraction of the launched energy (default 1e-24). */
  energyTolerance?: number;
  /** Hard cap on the number of unit-delay steps (default 200,000). */
  maxSteps?: number;
};

/** What one impulse run found. */
export type ImpulseResponse = {
  inputPort: string;
  /** h[n] at every output port, same order as `Netlist.outputPorts`; index n = number of unit delays. */
  outputs: readonly ComplexSeries[];
  steps: number;
  /** Energy still in the mesh when the run stopped (fraction of the launched energy). */
  residualEnergy: number;
  converged: boolean;
  /** Energy that reached unconnected output slots (absorbed). */
  openEndEnergy: number;
  /** Mean decay of the energy left in the mesh over the last steps, dB per step (0 for a lossless loop). */
  decayDbPerStep: number;
  /** Set when the energy does not decay (nearly lossless loop), with a plain explanation. */
  warning: string | null;
};

/**
 * Runs the impulse response from one input port: x[0] = impulse at that port's input slot,
 * x[n+1] = routed(T x[n]); light reaching an output port at step n+1 is h[n+1].
 * Stops when the energy in the mesh is below `energyTolerance`, or at `maxSteps` (then reports a warning).
 * Cost per step is proportional to the number of stages that carry light.
 */
export function impulseResponse(netlist: Netlist, inputPort: string, options: ImpulseOptions = {}): ImpulseResponse {
  const tolerance = options.energyTolerance ?? 1e-24;
  const maxSteps = options.maxSteps ?? 200_000;
  if (!(tolerance > 0 && tolerance < 1)) throw new SolverInputError(`solver: energyTolerance must be in (0, 1), got ${tolerance}`);
  if (!(Number.isInteger(maxSteps) && maxSteps > 0)) throw new SolverInputError(`solver: maxSteps must be a positive integer, got ${maxSteps}`);
  const p = inputPortIndex(netlist, inputPort);
  const { transfers: t, target, stageCount } = netlist;
  const slots = stageCount * 2;
  let xr = new Float64Array(slots), xi = new Float64Array(slots);
  let nr = new Float64Array(slots), ni = new Float64Array(slots);
  // Active stages of this step and the next, so a step costs what carries light, not the whole chip.
  let active = new Int32Array(stageCount), nextActive = new Int32Array(stageCount);
  const mark = new Int32Array(stageCount).fill(-1);
  const start = netlist.inputSlots[p] ?? 0;
  xr[start] = 1;
  active[0] = start >> 1;
  let activeCount = 1;
  const outCount = netlist.outputPorts.length;
  const outRe: number[][] = Array.from({ length: outCount }, () => [0]);
  const outIm: number[][] = Array.from({ length: outCount }, () => [0]);
  let energy = 1, openEnd = 0, step = 0;
  const history: number[] = [];
  while (energy >= tolerance && step < maxSteps) {
    step += 1;
    for (const arr of outRe) arr.push(0);
    for (const arr of outIm) arr.push(0);
    let nextCount = 0;
    for (let a = 0; a < activeCount; a++) {
      const s = active[a] ?? 0;
      const k = 2 * s, o = 8 * s;
      const a0r = xr[k] ?? 0, a0i = xi[k] ?? 0, a1r = xr[k + 1] ?? 0, a1i = xi[k + 1] ?? 0;
      xr[k] = 0; xi[k] = 0; xr[k + 1] = 0; xi[k + 1] = 0;
      const t00r = t[o] ?? 0, t00i = t[o + 1] ?? 0, t01r = t[o + 2] ?? 0, t01i = t[o + 3] ?? 0;
      const t10r = t[o + 4] ?? 0, t10i = t[o + 5] ?? 0, t11r = t[o + 6] ?? 0, t11i = t[o + 7] ?? 0;
      for (let side = 0; side < 2; side++) {
        const yr = side === 0 ? t00r * a0r - t00i * a0i + t01r * a1r - t01i * a1i : t10r * a0r - t10i * a0i + t11r * a1r - t11i * a1i;
        const yi = side === 0 ? t00r * a0i + t00i * a0r + t01r * a1i + t01i * a1r : t10r * a0i + t10i * a0r + t11r * a1i + t11i * a1r;
        if (yr === 0 && yi === 0) continue;
        const dest = target[k + side] ?? OPEN_END;
        if (dest >= 0) {
          nr[dest] = (nr[dest] ?? 0) + yr;
          ni[dest] = (ni[dest] ?? 0) + yi;
          const ds = dest >> 1;
          if (mark[ds] !== step) { mark[ds] = step; nextActive[nextCount++] = ds; }
        } else if (dest === OPEN_END) {
          openEnd += yr * yr + yi * yi;
        } else {
          const q = -1 - dest;
          (outRe[q] as number[])[step] = yr;
          (outIm[q] as number[])[step] = yi;
        }
      }
    }
    [xr, nr] = [nr, xr];
    [xi, ni] = [ni, xi];
    [active, nextActive] = [nextActive, active];
    activeCount = nextCount;
    energy = 0;
    for (let a = 0; a < activeCount; a++) {
      const k = 2 * (active[a] ?? 0);
      energy += (xr[k] ?? 0) ** 2 + (xi[k] ?? 0) ** 2 + (xr[k + 1] ?? 0) ** 2 + (xi[k + 1] ?? 0) ** 2;
    }
    history.push(energy);
  }
  const decay = decayRate(history);
  const converged = energy < tolerance;
  return {
    inputPort,
    outputs: outRe.map((re, q) => ({ re: Float64Array.from(re), im: Float64Array.from(outIm[q] ?? []) })),
    steps: step,
    residualEnergy: energy,
    converged,
    openEndEnergy: openEnd,
    decayDbPerStep: decay,
    warning: converged
      ? null
      : `the impulse did not decay below ${tolerance} in ${step} steps (energy left ${energy.toExponential(3)}, ` +
        `decay ${decay.toFixed(4)} dB per step): a loop is nearly lossless; the response near its resonances is not exact`,
  };
}

/** Mean decay of the energy over the last quarter of the run, dB per step. */
function decayRate(history: readonly number[]): number {
  const n = history.length;
  if (n < 8) return Infinity;
  const from = Math.floor((3 * n) / 4) - 1;
  const e0 = history[from] ?? 0, e1 = history[n - 1] ?? 0;
  if (e1 <= 0 || e0 <= 0) return Infinity;
  return (10 * Math.log10(e0 / e1)) / (n - 1 - from);
}
