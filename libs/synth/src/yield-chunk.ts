/** One Monte Carlo chunk of a yield study as plain data in and out, for worker threads (CLI and server). */
import { buildMesh, type Configuration } from '@hexloom/mesh';
import type { MaskRegion } from './mask-types.js';
import { runMonteCarloChunk, type MonteCarloChunk, type MonteCarloRun } from './monte-carlo.js';
import { yieldTrial, type ToleranceModel } from './yield-trial.js';

/** Everything a worker needs, structured-cloneable. */
export type YieldChunkTask = {
  configuration: Configuration;
  from: string;
  to: string;
  offsetsHz: number[];
  mask: MaskRegion[];
  tolerance: ToleranceModel;
  chunk: MonteCarloChunk;
};

/** Runs the chunk's seeded runs; a run gives the same result in any chunk and on any thread. */
export function runYieldChunk(task: YieldChunkTask): MonteCarloRun[] {
  const mesh = buildMesh(task.configuration.mesh);
  const trial = yieldTrial({ mesh, configuration: task.configuration, from: task.from, to: task.to, offsetsHz: task.offsetsHz, mask: task.mask, tolerance: task.tolerance });
  return runMonteCarloChunk(task.chunk, trial);
}
