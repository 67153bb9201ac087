// A one-cell chip with its gates parked in bar, for the workspace's unit tests (invented values).
import type { ConfigurationFile } from '@hexloom/contracts';
import { buildMesh } from '@hexloom/mesh';

export const SMALL_CONTENT: ConfigurationFile = {
  schemaVersion: 1,
  mesh: {
    schemaVersion: 1,
    name: 'one cell (invented)',
    shape: { kind: 'rectangle', rows: 1, columns: 1 },
    technology: { unitLengthUm: 650, groupIndex: 4.2, referenceFrequencyHz: 193.4e12, lossPerGateDb: 0.25, bendLossDb: 0, extinctionDb: 25, phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 } },
    ioSites: [],
    ports: [],
    deadGates: [],
  },
  parkedState: 'bar',
  gates: [],
  circuits: [],
};

/** Gate ids of the one-cell chip, in the mesh's order. */
export const SMALL_GATES: string[] = buildMesh(SMALL_CONTENT.mesh).gates.map((g) => g.id);
