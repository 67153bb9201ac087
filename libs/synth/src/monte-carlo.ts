/** Seeded Monte Carlo split into chunks: plan, run one chunk with progress, and summarise the runs. */
import { randomStream, type RandomStream } from './seeded-normal.js';
import { SynthInputError } from './synth-input-error.js';

/**
 * One slice of a study: runs `start .. start + count - 1` of the study seeded with `seed`; `index` is the chunk's
 * place in the plan. Each run draws from its own stream (seed, run index), so the slicing never changes a run.
 */
export type MonteCarloChunk = { index: number; seed: number; start: number; count: number };

/** What one run reports: whether it met the mask, and its figures by name. */
export type MonteCarloRun = { pass: boolean; figures: Record<string, number> };

/**
 * Splits `runs` into chunks of at most `chunkSize`, for progress and worker threads. Results do not depend on
 * `chunkSize`: run r draws from `randomStream(seed, r)` in whichever chunk it falls.
 */
export function planMonteCarlo({ runs, seed, chunkSize }: { runs: number; seed: number; chunkSize: number }): MonteCarloChunk[] {
  if (!(Number.isInteger(runs) && runs >= 1 && runs <= 1_000_000)) throw new SynthInputError(`synth: runs must be 1..1000000, got ${runs}`);
  if (!(Number.isInteger(chunkSize) && chunkSize >= 1)) throw new SynthInputError(`synth: chunkSize must be a positive integer, got ${chunkSize}`);
  if (!Number.isInteger(seed)) throw new SynthInputError(`synth: seed must be an integer, got ${seed}`);
  const chunks: MonteCarloChunk[] = [];
  for (let start = 0, index = 0; start < runs; start += chunkSize, index++) chunks.push({ index, seed, start, count: Math.min(chunkSize, runs - start) });
  return chunks;
}

/**
 * Runs one chunk, giving run `chunk.start + k` its own stream `randomStream(chunk.seed, chunk.start + k)`;
 * `onProgress(done, count)` after every run. A run gives the same result in any chunk, on any thread.
 */
export function runMonteCarloChunk(chunk: MonteCarloChunk, trial: (random: RandomStream, runIndex: number) => MonteCarloRun, onProgress?: (done: number, count: number) => void): MonteCarloRun[] {
  const results: MonteCarloRun[] = [];
  for (let k = 0; k < chunk.count; k++) {
    const runIndex = chunk.start + k;
    results.push(trial(randomStream(chunk.seed, runIndex), runIndex));
    onProgress?.(k + 1, chunk.count);
  }
  return results;
}

export type FigureSpread = { mean: number; std: number; min: number; p05: number; p50: number; p95: number; max: number };

export type MonteCarloSummary = {
  runs: number;
  passed: number;
  /** Fraction of runs that met the mask, with its binomial standard error sqrt(y (1 - y) / n) (common practice). */
  yield: number;
  yieldStdError: number;
  figures: Record<string, FigureSpread>;
};

const percentile = (sorted: number[], p: number): number => {
  const position = p * (sorted.length - 1);
  const lo = Math.floor(position);
  const hi = Math.ceil(position);
  return (sorted[lo] as number) + ((sorted[hi] as number) - (sorted[lo] as number)) * (position - lo);
};

/** Yield and the spread of each figure over all runs (percentiles by linear interpolation, common practice). */
export function summariseMonteCarlo(runs: readonly MonteCarloRun[]): MonteCarloSummary {
  if (runs.length === 0) throw new SynthInputError('synth: cannot summarise a study without runs');
  const passed = runs.filter((r) => r.pass).length;
  const y = passed / runs.length;
  const names = [...new Set(runs.flatMap((r) => Object.keys(r.figures)))];
  const figures: Record<string, FigureSpread> = {};
  for (const name of names) {
    const values = runs.map((r) => r.figures[name]).filter((v): v is number => v !== undefined && Number.isFinite(v)).sort((a, b) => a - b);
    if (values.length === 0) continue;
    const mean = values.reduce((s, v) => s + v, 0) / values.length;
    const variance = values.length > 1 ? values.reduce((s, v) => s + (v - mean) ** 2, 0) / (values.length - 1) : 0;
    figures[name] = { mean, std: Math.sqrt(variance), min: values[0] as number, p05: percentile(values, 0.05), p50: percentile(values, 0.5), p95: percentile(values, 0.95), max: values[values.length - 1] as number };
  }
  return { runs: runs.length, passed, yield: y, yieldStdError: Math.sqrt((y * (1 - y)) / runs.length), figures };
}
