// Shared test fixtures: a demo technology profile and mesh-definition builders.
import type { MeshDefinition, MeshShape, TechnologyProfile } from '../src/index.js';

/** Demo figures (invented, from the demo scenario). */
export const DEMO_TECHNOLOGY: TechnologyProfile = {
  unitLengthUm: 650,
  groupIndex: 4.2,
  referenceFrequencyHz: 193.4e12,
  lossPerGateDb: 0.25,
  bendLossDb: 0.05,
  extinctionDb: 25,
  phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 },
};

export function definition(shape: MeshShape, extra: Partial<MeshDefinition> = {}): MeshDefinition {
  return { schemaVersion: 1, name: 'fixture', shape, technology: DEMO_TECHNOLOGY, ioSites: [], ports: [], deadGates: [], ...extra };
}
