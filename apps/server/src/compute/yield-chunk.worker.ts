/** Worker-thread task: one chunk of a Monte Carlo yield study (built on the synth library's yield trial). */
import type { ConfigurationFile } from '@hexloom/contracts';
import { buildMesh } from '@hexloom/mesh';
import { runMonteCarloChunk, yieldTrial, type MaskRegion, type MonteCarloChunk, type MonteCarloRun, type ToleranceModel } from '@hexloom/synth';

/** Everything a worker needs, as structured-cloneable data. */
export type YieldChunkTask = {
  content: ConfigurationFile;
  from: string;
  to: string;
  offsetsHz: number[];
  mask: MaskRegion[];
  tolerance: ToleranceModel;
  chunk: MonteCarloChunk;
};

/** Runs the chunk; the same chunk gives the same runs on any thread (seeded streams). */
export default function runYieldChunk(task: YieldChunkTask): MonteCarloRun[] {
  const trial = yieldTrial({
    mesh: buildMesh(task.content.mesh),
    configuration: task.content,
    from: task.from,
    to: task.to,
    offsetsHz: task.offsetsHz,
    mask: task.mask,
    tolerance: task.tolerance,
  });
  return runMonteCarloChunk(task.chunk, (random) => trial(random));
}
