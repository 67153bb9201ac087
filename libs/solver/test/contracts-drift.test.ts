// The solver's CSV columns and the contracts' published header must never drift apart.
import { describe, expect, it } from 'vitest';
import { SPECTRUM_CSV_HEADER, SPECTRUM_SCHEMA_VERSION, spectrumFileSchema } from '../../contracts/src/index.js';
import { emptyConfiguration } from '@hexloom/mesh';
import { netlistFromMesh, simulateConnection, SPECTRUM_CSV_COLUMNS, SPECTRUM_FILE_VERSION, toSpectrumFile } from '../src/index.js';
import { DEMO_TECH, meshWithIo } from './mesh-fixtures.js';

describe('spectrum CSV columns', () => {
  it('are the same in the solver writer and in libs/contracts', () => {
    expect([...SPECTRUM_CSV_COLUMNS]).toEqual([...SPECTRUM_CSV_HEADER]);
  });
});

describe('spectrum file', () => {
  it('is what the contracts schema accepts, with the same version', () => {
    const mesh = meshWithIo({ kind: 'hexagon', radius: 1 }, DEMO_TECH, 3);
    const chip = netlistFromMesh({ mesh, configuration: emptyConfiguration(mesh.definition) });
    const [from, to] = mesh.ports.map((p) => p.id);
    const result = simulateConnection(chip.netlist, { from: from!, to: to!, grid: { kind: 'fsr', points: 16 }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    expect(SPECTRUM_FILE_VERSION).toBe(SPECTRUM_SCHEMA_VERSION);
    const file = toSpectrumFile(result);
    expect(spectrumFileSchema.parse(file)).toEqual(file);
  });
});
