// The worker's message loop: keeps only the newest request, computes it, answers it; older queued requests are dropped.
import { computeSpectra } from '../utils/computeSpectra.js';
import type { SolverAnswer, SolverRequest } from './solverProtocol.js';

/** Schedules `run` after the messages already queued (a timer task comes after them). */
export type Scheduler = (run: () => void) => void;

const nextTask: Scheduler = (run) => {
  setTimeout(run, 0);
};

/**
 * A handler for request messages that answers through `post`. Requests arriving while one is computed wait; when
 * it ends, only the newest of them is computed (a dragged slider sends many, and only the last position matters).
 */
export function solverMessageHandler(post: (answer: SolverAnswer) => void, schedule: Scheduler = nextTask, compute = computeSpectra): (request: SolverRequest) => void {
  let latest: SolverRequest | undefined;
  let scheduled = false;
  const run = (): void => {
    scheduled = false;
    const request = latest;
    latest = undefined;
    if (!request) return;
    const started = performance.now();
    try {
      post({ id: request.id, ok: true, spectra: compute(request), elapsedMs: performance.now() - started });
    } catch (error) {
      post({ id: request.id, ok: false, error: error instanceof Error ? error.message : String(error) });
    }
  };
  return (request) => {
    if (!latest || request.id > latest.id) latest = request;
    if (!scheduled) {
      scheduled = true;
      schedule(run);
    }
  };
}
