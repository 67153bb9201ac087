/** One Monte Carlo chunk of a yield study as plain data in and out, for worker threads (CLI and server). */
import type { FilterSpec } from '@hexloom/contracts';
import { buildMesh, type Configuration } from '@hexloom/mesh';
import type { MaskRegion } from './mask-types.js';
import { runMonteCarloChunk, type MonteCarloChunk, type MonteCarloRun } from './monte-carlo.js';
import { specYieldTrial, yieldTrial, type ToleranceModel } from './yield-trial.js';

/** A study of one port pair against a mask (the server's yield jobs). */
export type MaskYieldTask = { configuration: Configuration; from: string; to: string; offsetsHz: number[]; mask: MaskRegion[]; tolerance: ToleranceModel; chunk: MonteCarloChunk };

/** A study of a circuit against its whole spec: every output, mask and targets (the CLI's `hexloom yield`). */
export type SpecYieldTask = { configuration: Configuration; spec: FilterSpec; circuitId: string; tolerance: ToleranceModel; chunk: MonteCarloChunk };

/** Everything a worker needs, structured-cloneable. */
export type YieldChunkTask = MaskYieldTask | SpecYieldTask;

/** Runs the chunk's seeded runs; a run gives the same result in any chunk and on any thread. */
export function runYieldChunk(task: YieldChunkTask): MonteCarloRun[] {
  const mesh = buildMesh(task.configuration.mesh);
  const trial =
    'spec' in task
      ? specYieldTrial({ mesh, configuration: task.configuration, spec: task.spec, circuitId: task.circuitId, tolerance: task.tolerance })
      : yieldTrial({ mesh, configuration: task.configuration, from: task.from, to: task.to, offsetsHz: task.offsetsHz, mask: task.mask, tolerance: task.tolerance });
  return runMonteCarloChunk(task.chunk, trial);
}
