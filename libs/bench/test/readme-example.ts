// The README example of @hexloom/bench, runnable with tsx and run by readme-example.test.ts.
import { buildBenchExport, driveForPhase, parseCalibrationCsv, writeBenchExportCsv } from '../src/index.js';
import { emptyConfiguration, makeMeshDefinition } from '@hexloom/mesh';

/** Runs the README example and returns what it prints. */
export async function runReadmeExample(): Promise<{ drivePowerW: number; totalPowerW: number; csv: string }> {
  const calibration = parseCalibrationCsv('gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v\n"g(0,0)e",theta,0.2,22,1200,80,12\n');
  const first = calibration[0];
  if (!first) throw new Error('no calibration row');
  const drive = driveForPhase(first, Math.PI);
  const chip = makeMeshDefinition({
    name: 'two-cell demo',
    shape: { kind: 'rectangle', rows: 1, columns: 2 },
    technology: { unitLengthUm: 650, groupIndex: 4.2, referenceFrequencyHz: 193.4e12, lossPerGateDb: 0.25, bendLossDb: 0, extinctionDb: 25, phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.08, maxVoltageV: 12 } },
  });
  const result = await buildBenchExport({ configuration: emptyConfiguration(chip, 'bar'), calibration, chip: 'two-cell demo', configurationName: 'parked', version: 1, approved: false });
  if (!result.ok) throw new Error(`violations: ${result.violations.length}`);
  return { drivePowerW: drive.powerW, totalPowerW: result.export.totalPowerW, csv: writeBenchExportCsv(result.export) };
}

if (process.argv[1]?.endsWith('readme-example.ts')) {
  console.log(await runReadmeExample());
}
