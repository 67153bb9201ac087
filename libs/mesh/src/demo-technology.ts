/** The technology profile of the invented demo scenario: a default for examples, tests and `hexloom mesh`. */
import type { TechnologyProfile } from './mesh-definition.js';

/**
 * Invented demo figures (not a real process): 650 um units, group index 4.2, 0.25 dB per gate, 25 dB extinction,
 * heaters of P_pi 22 mW and 1.2 kOhm limited to 60 mW / 9 V, spreads of 0.01 rad (couplers) and 0.02 rad (phases).
 */
export const DEMO_TECHNOLOGY: TechnologyProfile = {
  unitLengthUm: 650,
  groupIndex: 4.2,
  referenceFrequencyHz: 193.4e12,
  lossPerGateDb: 0.25,
  bendLossDb: 0.05,
  extinctionDb: 25,
  phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 },
  tolerance: { couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 },
};
