// Replays a yield job's seeded runs in the browser, for the per-run margins the job's summary does not carry.
import type { ConfigurationFile, StartYieldJob } from '@hexloom/contracts';
import { buildMesh } from '@hexloom/mesh';
import { gridOffsetsHz, unitDelayS } from '@hexloom/solver';
import { gateSensitivities, resolveMeshPort, runYieldChunk, type GateSensitivity, type MaskYieldTask } from '@hexloom/synth';

/** Everything but the chunk: run r of a task draws from the stream (seed, r), so any slicing gives the server's runs. */
export type YieldReplayStudy = Omit<MaskYieldTask, 'chunk'> & { runs: number; seed: number };

/** The study a job body describes on `content` (ports resolved by id or label, offsets of its grid). */
export function yieldReplayStudy(content: ConfigurationFile, request: StartYieldJob): YieldReplayStudy {
  const mesh = buildMesh(content.mesh);
  const from = resolveMeshPort(mesh, request.from);
  const to = resolveMeshPort(mesh, request.to);
  if (from === null || to === null) throw new Error(`The port ${from === null ? request.from : request.to} is not on this chip.`);
  const { unitLengthUm, groupIndex } = content.mesh.technology;
  const offsetsHz = Array.from(gridOffsetsHz(request.grid, unitDelayS({ unitLengthUm, groupIndex })));
  return {
    configuration: content,
    from,
    to,
    offsetsHz,
    mask: request.mask.regions,
    tolerance: { couplerSigmaRad: request.couplerSigmaRad, phaseSigmaRad: request.phaseSigmaRad },
    runs: request.runs,
    seed: request.seed,
  };
}

/** Worst mask margin (dB, negative = fails) and pass of runs `start .. start + count - 1`. */
export function replayRuns(study: YieldReplayStudy, start: number, count: number): { marginDb: number; pass: boolean }[] {
  const { runs: _runs, seed, ...task } = study;
  return runYieldChunk({ ...task, chunk: { index: 0, seed, start, count } }).map((r) => ({ marginDb: r.figures.worstMarginDb ?? 0, pass: r.pass }));
}

/** Change of the worst margin per radian of error on each used gate, largest first (central differences). */
export function replaySensitivities(study: YieldReplayStudy): GateSensitivity[] {
  return gateSensitivities({ ...study, mesh: buildMesh(study.configuration.mesh) });
}
