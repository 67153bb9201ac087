// Which solver worker factory the response hooks use: the real worker by default, an injected one in tests.
import { createContext } from 'react';
import { createSolverWorker } from '../workers/createSolverWorker.js';
import type { SolverWorkerFactory } from '../workers/solverWorkerLike.js';

/** The factory `useWorkerResponse` creates its worker with; provide another (e.g. `createInThreadSolver`) to inject one. */
export const SolverWorkerContext = createContext<SolverWorkerFactory>(createSolverWorker);
