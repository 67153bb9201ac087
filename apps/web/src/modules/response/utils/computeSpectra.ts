// The worker's computation: the shared simulation function of libs/synth, with the chip's mesh kept between redraws.
import type { SpectrumFile } from '@hexloom/contracts';
import { buildMesh, type Mesh } from '@hexloom/mesh';
import { simulateConfiguration } from '@hexloom/synth';
import type { SolverRequest } from '../workers/solverProtocol.js';

/** Most unit-delay steps of an impulse run, as on the team server (a loop that decays slower comes with a warning). */
export const BROWSER_MAX_IMPULSE_STEPS = 20_000;

let cached: { key: string; mesh: Mesh } | undefined;

/** The mesh of a definition, rebuilt only when the definition changes (a slider drag changes gate settings only). */
function meshOf(definition: SolverRequest['content']['mesh']): Mesh {
  const key = JSON.stringify(definition);
  if (cached?.key !== key) cached = { key, mesh: buildMesh(definition) };
  return cached.mesh;
}

/**
 * The spectra of a request, one per pair, computed exactly as the server's simulate route does
 * (libs/synth `simulateConfiguration`, the same impulse-step cap).
 */
export function computeSpectra(request: Pick<SolverRequest, 'content' | 'pairs' | 'grid'>): SpectrumFile[] {
  return simulateConfiguration({ content: request.content, mesh: meshOf(request.content.mesh), pairs: request.pairs, grid: request.grid, maxImpulseSteps: BROWSER_MAX_IMPULSE_STEPS });
}
