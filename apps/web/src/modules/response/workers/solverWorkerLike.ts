// What the page needs of a solver worker (a real Web Worker or the in-thread stand-in), and the factory that makes one.
import type { SolverAnswer, SolverRequest } from './solverProtocol.js';

/** What the hook needs of a worker: send a request, hear answers and failures, stop it. */
export type SolverWorkerLike = {
  postMessage: (request: SolverRequest) => void;
  onmessage: ((event: MessageEvent<SolverAnswer>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  terminate: () => void;
};

/** Makes a solver worker (tests inject an in-thread or fake one). */
export type SolverWorkerFactory = () => SolverWorkerLike;
