/** @hexloom/synth: filter and delay synthesis for hexagonal meshes (pure, portable). */
export { SynthInputError } from './synth-input-error.js';
export { lowpassPrototype } from './lowpass-prototype.js';
export type { PrototypeInput, PrototypeKind } from './lowpass-prototype.js';
export {
  ringAddDropPower,
  ringAllPassDelayAtResonance,
  ringAllPassMinimum,
  ringAllPassPower,
  ringFinesse,
  ringWidthFraction,
} from './ring-equations.js';
export { describeAllPassRing, designAddDropRing, designAllPassRing } from './ring-design.js';
export type { AddDropDesign, RingCouplingRegime, RingDesign, RingDesignInput, RingTarget } from './ring-design.js';
export { designCoupledRingBandpass } from './coupled-ring-design.js';
export type { CoupledRingDesign, CoupledRingInput } from './coupled-ring-design.js';
export type { Complex } from './complex.js';
export { latticeResponse } from './lattice-response.js';
export type { LatticeParameters, LatticePolynomials } from './lattice-response.js';
export { complementarityError, complementaryPolynomial } from './spectral-factor.js';
export { peelLattice } from './layer-peeling.js';
export { besselI0, designFirTarget, kaiserBeta } from './fir-window-design.js';
export type { FirBand, FirDesignInput } from './fir-window-design.js';
export { polynomialRoots } from './polynomial-roots.js';
export type { FrequencyRange, MaskRegion, SampledResponse } from './mask-types.js';
export { checkMask } from './check-mask.js';
export type { CheckUnit, MaskCheck, MaskReport } from './check-mask.js';
export { checkRatio, maskCheck, maskReport } from './check-mask.js';
export { responseFigures } from './response-figures.js';
export type { ResponseFigures } from './response-figures.js';
export { chooseDelaySet, chooseDelayUnits } from './delay-design.js';
export type { DelayChoice, DelayChoiceInput } from './delay-design.js';
export { nelderMead } from './nelder-mead.js';
export type { MinimiseResult } from './nelder-mead.js';
export { allPassStageDelayS, designAllPassEqualiser } from './allpass-equaliser-design.js';
export type { AllPassEqualiser, AllPassEqualiserInput, AllPassStage } from './allpass-equaliser-design.js';
export { randomStream } from './seeded-normal.js';
export type { RandomStream } from './seeded-normal.js';
export { planMonteCarlo, runMonteCarloChunk, summariseMonteCarlo } from './monte-carlo.js';
export type { FigureSpread, MonteCarloChunk, MonteCarloRun, MonteCarloSummary } from './monte-carlo.js';
export type { RealisationNote } from './realisation-note.js';
export { isRealisablePerimeter, perimeterForFsr } from './ring-perimeter.js';
export { designCircuit } from './design-circuit.js';
export type { CircuitDesign, DesignResult } from './design-circuit.js';
export { gateElement, phaseActsOn, settingLookup } from './gate-element.js';
export { circuitLoops } from './circuit-loops.js';
export type { CircuitLoop, LoopTraversal } from './circuit-loops.js';
export { alignCouplers } from './align-couplers.js';
export { tuneLoops } from './tune-loops.js';
export type { LoopTuning } from './tune-loops.js';
export { simulateTransmission, transmissionOf, transmissionsFrom } from './simulate-transmission.js';
export type { Refinement, Transmission } from './simulate-transmission.js';
export { MONTE_CARLO_DENSITY, verificationOffsets } from './verification-grid.js';
export { synthesise } from './synthesise.js';
export { coarseVerification, portName, verificationCost, verifyCircuit } from './verify-circuit.js';
export type { FailedCheck, Verdict, VerifyInput } from './verify-circuit.js';
export { circuitOutputs } from './circuit-outputs.js';
export type { CircuitOutput, OutputRole } from './circuit-outputs.js';
export { specTargets } from './spec-targets.js';
export { planDelaySet } from './plan-delay-set.js';
export type { DelaySetPlan, DelaySetPlanInput } from './plan-delay-set.js';
export { balanceSplitters } from './balance-splitters.js';
export { quietParking } from './quiet-parking.js';
export type { QuietParkingInput, QuietParkingResult } from './quiet-parking.js';
export { setCircuitPhases } from './set-circuit-phases.js';
export { DEFAULT_DELAY_BAND_HZ } from './design-circuit.js';
export { CRITICAL_NOTCH_MIN_DEPTH_DB } from './ring-targets.js';
export { kaiserTransitionFraction } from './lattice-targets.js';
export { busUnits } from './equaliser-targets.js';
export { bandNear, notchNear, slopeWithin, statsWithin, valueAt } from './response-measures.js';
export type { SynthesiseInput, SynthesisFailure, SynthesisSuccess, Verification } from './synthesise.js';
export { canonicalLattice, tuneLattice } from './tune-lattice.js';
export { drawPerturbations, gateSensitivities, MONTE_CARLO_IMPULSE, specYieldTrial, yieldTrial } from './yield-trial.js';
export type { GateSensitivity, SpecYieldStudy, ToleranceModel, YieldStudy } from './yield-trial.js';
export { runYieldChunk } from './yield-chunk.js';
export type { MaskYieldTask, SpecYieldTask, YieldChunkTask } from './yield-chunk.js';
export { savedFigures, verifySpec } from './verify-spec.js';
export type { SpecCheck } from './verify-spec.js';
export { resolveMeshPort, simulateConfiguration } from './simulate-configuration.js';
export type { PortPair, SimulateConfigurationInput } from './simulate-configuration.js';
