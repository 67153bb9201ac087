// The factory of the solver worker: a real Web Worker in the browser, the in-thread solver where there is none.
import { createInThreadSolver } from './createInThreadSolver.js';
import type { SolverWorkerFactory, SolverWorkerLike } from './solverWorkerLike.js';

/** The Web Worker of `solver.worker.ts` (a module worker bundled by Vite), or the in-thread solver without Worker support. */
export const createSolverWorker: SolverWorkerFactory = () => {
  if (typeof Worker === 'undefined') return createInThreadSolver();
  return new Worker(new URL('./solver.worker.ts', import.meta.url), { type: 'module', name: 'hexloom-solver' }) as unknown as SolverWorkerLike;
};
