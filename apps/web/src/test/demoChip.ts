// Invented demo chip data for the web tests: one chip, one configuration, one version, one simulated spectrum.
import type { Chip, ConfigurationDetail, ConfigurationSummary, ConfigurationVersion, SpectrumFile } from '@hexloom/contracts';
import { DEMO_TEAM_ID } from './demoTeam.js';

export const DEMO_CHIP_ID = '7a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d';
export const DEMO_CONFIGURATION_ID = '8b2c3d4e-5f6a-4b7c-9d8e-0f1a2b3c4d5e';
const IN = 'v(0,0)n/g(0,0)ne';
const OUT = 'v(1,0)n/g(1,0)ne';

const definition: Chip['definition'] = {
  schemaVersion: 1,
  name: 'Demo mesh (invented)',
  shape: { kind: 'rectangle', rows: 8, columns: 12 },
  technology: {
    unitLengthUm: 650,
    groupIndex: 4.2,
    referenceFrequencyHz: 193.4e12,
    lossPerGateDb: 0.25,
    bendLossDb: 0.05,
    extinctionDb: 25,
    phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 },
  },
  ioSites: [],
  ports: [],
  deadGates: [],
};

export const demoChip: Chip = { id: DEMO_CHIP_ID, name: 'Demo mesh (invented)', definition, revision: 1, createdBy: 'noor', createdAt: '2026-11-30T09:00:00.000Z', updatedAt: '2026-11-30T09:00:00.000Z', hasCalibration: true, affectedVersions: [] };

export const demoSummary: ConfigurationSummary = { id: DEMO_CONFIGURATION_ID, chipId: DEMO_CHIP_ID, name: 'Interferer notch', headVersion: 2, headStatus: 'in_review', createdBy: 'tobin', createdAt: '2026-11-30T09:00:00.000Z', updatedAt: '2026-11-30T10:00:00.000Z' };

const versionBase = { configurationId: DEMO_CONFIGURATION_ID, author: 'tobin', note: '', createdAt: '2026-11-30T10:00:00.000Z', approvedBy: null, approvedAt: null, deadGatesInUse: [] };

export const demoDetail: ConfigurationDetail = {
  ...demoSummary,
  versions: [
    { ...versionBase, id: '9c3d4e5f-6a7b-4c8d-8e9f-1a2b3c4d5e6f', number: 1, status: 'changes_requested', note: 'first try' },
    { ...versionBase, id: '0d4e5f6a-7b8c-4d9e-9f0a-2b3c4d5e6f7a', number: 2, status: 'in_review', note: 'deeper notch' },
  ],
};

export const demoVersion: ConfigurationVersion = {
  ...versionBase,
  id: '0d4e5f6a-7b8c-4d9e-9f0a-2b3c4d5e6f7a',
  number: 2,
  status: 'in_review',
  note: 'deeper notch',
  content: { schemaVersion: 1, mesh: definition, parkedState: 'bar', gates: [], circuits: [{ id: 'notch', kind: 'ring', ports: [IN, OUT], paths: [], couplers: [] }] },
  specs: [],
  figures: { notch: { notchDepthDb: 19.5, insertionLossDb: 7.51, failedChecks: 0, checks: 3 } },
};

/** A notch at 0 Hz: 5 points of transmission and group delay. */
export const demoSpectrum: SpectrumFile = {
  schemaVersion: 1,
  kind: 'hexloom-spectrum',
  from: IN,
  to: OUT,
  fromName: 'W01',
  toName: 'E01',
  referenceFrequencyHz: 193.4e12,
  unitDelayS: 9.1e-12,
  method: 'direct-sum',
  run: { inputPort: IN, steps: 420, residualEnergy: 1e-25, converged: true, warning: null },
  powerBalance: { inputPort: IN, chosen: { [OUT]: 0.2 }, leakage: {}, lost: 0.8, residual: 0 },
  points: {
    frequencyHz: [-2e9, -1e9, 0, 1e9, 2e9].map((f) => 193.4e12 + f),
    offsetHz: [-2e9, -1e9, 0, 1e9, 2e9],
    amplitudeDb: [-7.5, -9, -27, -9, -7.5],
    phaseDeg: [0, 10, 0, -10, 0],
    groupDelayPs: [250, 240, -400, 240, 250],
    dispersionPsPerNm: [0, 0, 0, 0, 0],
    re: [0.4, 0.35, 0.04, 0.35, 0.4],
    im: [0, 0, 0, 0, 0],
  },
};

/** The mock routes of the demo chip for mockApi. */
export const demoChipRoutes = {
  [`GET /api/teams/${DEMO_TEAM_ID}/chips`]: { body: [demoChip] },
  [`GET /api/teams/${DEMO_TEAM_ID}/chips/${DEMO_CHIP_ID}/configurations`]: { body: [demoSummary] },
  [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`]: { body: demoDetail },
  [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/2`]: { body: demoVersion },
  [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/1`]: { body: { ...demoVersion, id: demoDetail.versions[0]!.id, number: 1, status: 'changes_requested' } },
  [`POST /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/2/simulate`]: { body: demoSpectrum },
};
