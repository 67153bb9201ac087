/** @hexloom/solver: frequency-domain response of a configured hexagonal mesh (pure, portable). */
export { loopFsrHz, SolverInputError, SPEED_OF_LIGHT_M_PER_S, unitDelayS } from './unit-delay.js';
export type { UnitDelayInput } from './unit-delay.js';
export { couplerImbalanceRad, couplerTransfer, gateTransfer, thetaForKappa, transposeTransfer } from './gate-transfer.js';
export type { GatePerturbation, GateTransferInput, Transfer2x2 } from './gate-transfer.js';
export { compileNetlist, inputPortIndex, NetlistError, OPEN_END, outputPortIndex } from './netlist.js';
export type { Netlist, NetlistSpec, StageSlot, StageSpec } from './netlist.js';
export { impulseResponse } from './impulse-response.js';
export type { ComplexSeries, ImpulseOptions, ImpulseResponse } from './impulse-response.js';
export { gridOffsetsHz, isPowerOfTwo } from './frequency-grid.js';
export type { FrequencyGrid } from './frequency-grid.js';
export { dtftDirect, dtftUniform } from './dtft.js';
export { amplitudeDb, phaseRad, spectrumFromImpulse } from './spectrum.js';
export type { Spectrum, SpectrumInput } from './spectrum.js';
export { REFERENCE_MAX_SLOTS, referenceResponse } from './reference-response.js';
export type { ReferenceResponse } from './reference-response.js';
