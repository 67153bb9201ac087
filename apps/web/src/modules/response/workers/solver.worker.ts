// The solver Web Worker: computes the spectra of each newest request off the page's thread.
/// <reference lib="webworker" />
import { solverMessageHandler } from './solverMessageHandler.js';
import type { SolverAnswer, SolverRequest } from './solverProtocol.js';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const handle = solverMessageHandler((answer: SolverAnswer) => scope.postMessage(answer));
scope.onmessage = (event: MessageEvent<SolverRequest>) => handle(event.data);
