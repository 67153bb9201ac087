/** One Monte Carlo chunk of a yield study, run inside a worker thread (plain data in, plain data out). */
import { buildMesh, type Configuration } from '@hexloom/mesh';
import { runMonteCarloChunk, yieldTrial, type MaskRegion, type MonteCarloChunk, type MonteCarloRun, type ToleranceModel } from '@hexloom/synth';

export type YieldChunkTask = {
  configuration: Configuration;
  from: string;
  to: string;
  offsetsHz: number[];
  mask: MaskRegion[];
  tolerance: ToleranceModel;
  chunk: MonteCarloChunk;
};

/** Runs the chunk's seeded runs; the same task gives the same runs on any thread. */
export function runYieldChunk(task: YieldChunkTask): MonteCarloRun[] {
  const mesh = buildMesh(task.configuration.mesh);
  const trial = yieldTrial({ mesh, configuration: task.configuration, from: task.from, to: task.to, offsetsHz: task.offsetsHz, mask: task.mask, tolerance: task.tolerance });
  return runMonteCarloChunk(task.chunk, trial);
}
