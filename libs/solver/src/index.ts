/** @hexloom/solver: frequency-domain response of a configured hexagonal mesh (pure, portable). */
export { loopFsrHz, SolverInputError, SPEED_OF_LIGHT_M_PER_S, unitDelayS } from './unit-delay.js';
export type { UnitDelayInput } from './unit-delay.js';
