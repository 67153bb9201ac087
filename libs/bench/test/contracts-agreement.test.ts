// The bench library's outputs parse with the contracts' schemas, so the server's answers and the files agree.
import { emptyConfiguration, makeMeshDefinition } from '@hexloom/mesh';
import { describe, expect, it } from 'vitest';
import { benchExportSchema, BENCH_EXPORT_SCHEMA_VERSION as CONTRACT_VERSION, shifterCalibrationSchema } from '../../contracts/src/team-server/index.js';
import { BENCH_EXPORT_SCHEMA_VERSION, buildBenchExport, parseCalibrationCsv } from '../src/index.js';

const chip = makeMeshDefinition({
  name: 'agreement chip',
  shape: { kind: 'rectangle', rows: 1, columns: 2 },
  technology: { unitLengthUm: 650, groupIndex: 4.2, referenceFrequencyHz: 193.4e12, lossPerGateDb: 0.25, bendLossDb: 0, extinctionDb: 25, phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.08, maxVoltageV: 12 } },
});

describe('bench outputs and the contracts', () => {
  it('writes exports the contracts schema accepts, with the same schema version', async () => {
    const result = await buildBenchExport({ configuration: emptyConfiguration(chip, 'cross'), calibration: [], chip: 'c', configurationName: 'x', version: 3, approved: true });
    if (!result.ok) throw new Error('unexpected violations');
    expect(benchExportSchema.parse(JSON.parse(JSON.stringify(result.export)))).toEqual(result.export);
    expect(BENCH_EXPORT_SCHEMA_VERSION).toBe(CONTRACT_VERSION);
  });

  it('reads calibration rows the contracts schema accepts', () => {
    const rows = parseCalibrationCsv('gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v\n"g(0,0)e",phi,-6.2,0.1,1,0.1,0.1\n"g(0,0)ne",theta,6.2,1000,1000000,2000,100\n');
    for (const row of rows) expect(shifterCalibrationSchema.parse(row)).toEqual(row);
  });
});
