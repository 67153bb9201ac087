/** Frequency grids of a response: a uniform grid over one unit FSR, or any span at any number of points. */
import { SolverInputError } from './unit-delay.js';

/**
 * `fsr`: `points` uniform offsets from -FSR/2 (inclusive) to +FSR/2 (exclusive) around the reference
 * frequency, FSR = 1 / T_u; computed by FFT when `points` is a power of two.
 * `span`: `points` offsets from `startOffsetHz` to `stopOffsetHz` inclusive, computed by direct sum.
 */
export type FrequencyGrid =
  | { kind: 'fsr'; points: number }
  | { kind: 'span'; startOffsetHz: number; stopOffsetHz: number; points: number }
  | { kind: 'list'; offsetsHz: readonly number[] };

/** Offsets from the reference frequency, Hz, of every point of a grid. */
export function gridOffsetsHz(grid: FrequencyGrid, unitDelayS: number): Float64Array {
  if (grid.kind === 'list') {
    if (grid.offsetsHz.length === 0 || !grid.offsetsHz.every(Number.isFinite)) {
      throw new SolverInputError(`solver: a frequency list needs finite offsets, got ${grid.offsetsHz.length} values`);
    }
    return Float64Array.from(grid.offsetsHz);
  }
  if (!(Number.isInteger(grid.points) && grid.points >= 1 && grid.points <= 1 << 22)) {
    throw new SolverInputError(`solver: points must be an integer in [1, 4194304], got ${grid.points}`);
  }
  const n = grid.points;
  if (grid.kind === 'fsr') {
    const df = 1 / (n * unitDelayS);
    return Float64Array.from({ length: n }, (_, i) => (i - Math.floor(n / 2)) * df);
  }
  const { startOffsetHz: a, stopOffsetHz: b } = grid;
  if (!(Number.isFinite(a) && Number.isFinite(b) && b >= a)) {
    throw new SolverInputError(`solver: span needs finite start <= stop, got ${a} .. ${b}`);
  }
  if (n === 1) return Float64Array.of(a);
  return Float64Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
}

/** True when a positive integer is a power of two (FFT sizes). */
export function isPowerOfTwo(n: number): boolean {
  return Number.isInteger(n) && n >= 1 && (n & (n - 1)) === 0;
}
