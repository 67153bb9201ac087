// The solver on the page's own thread, through the worker's message handler: for tests and browsers without workers.
import { solverMessageHandler } from './solverMessageHandler.js';
import type { SolverWorkerFactory, SolverWorkerLike } from './solverWorkerLike.js';

/** A solver on the calling thread with the worker's own message handler (answers arrive asynchronously, as from a worker). */
export const createInThreadSolver: SolverWorkerFactory = () => {
  let stopped = false;
  const solver: SolverWorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage: (request) => handle(structuredClone(request)),
    terminate: () => {
      stopped = true;
    },
  };
  const handle = solverMessageHandler((answer) => {
    if (!stopped) solver.onmessage?.(new MessageEvent('message', { data: answer }));
  });
  return solver;
};
