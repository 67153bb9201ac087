// The bench export: drive values for every live gate, total power, refusal beyond limits, checksum.
import { buildMesh, DEMO_TECHNOLOGY, emptyConfiguration, makeMeshDefinition, type Configuration, type MeshDefinition } from '@hexloom/mesh';
import { describe, expect, it } from 'vitest';
import { BENCH_CAUTIONS, BENCH_EXPORT_CSV_COLUMNS, buildBenchExport, verifyBenchExport, writeBenchExportCsv, type BenchExport } from '../src/index.js';

// A small invented chip: 2 x 2 cells, P_pi 22 mW, 1.2 kOhm heaters.
const chip: MeshDefinition = makeMeshDefinition({
  name: 'bench test chip',
  shape: { kind: 'rectangle', rows: 2, columns: 2 },
  technology: { ...DEMO_TECHNOLOGY, bendLossDb: 0, phaseShifter: { ...DEMO_TECHNOLOGY.phaseShifter, maxPowerW: 0.08, maxVoltageV: 12 } },
});
const gateCount = buildMesh(chip).gates.length;
const meta = { chip: 'bench test chip', configurationName: 'parked', version: 1, approved: false };

const exportOf = async (configuration: Configuration, calibration = [] as Parameters<typeof buildBenchExport>[0]['calibration']): Promise<BenchExport> => {
  const result = await buildBenchExport({ configuration, calibration, ...meta });
  if (!result.ok) throw new Error(`unexpected violations: ${JSON.stringify(result.violations)}`);
  return result.export;
};

describe('buildBenchExport', () => {
  it('drives every bar-parked gate with P_pi on its theta heater (theta = pi for bar) and nothing on phi', async () => {
    const sut = await exportOf(emptyConfiguration(chip, 'bar'));
    expect(sut.drives).toHaveLength(2 * gateCount);
    // kappa = cos^2(theta / 2): bar (kappa 0) needs theta = pi, i.e. P = P_pi (common practice).
    for (const d of sut.drives.filter((x) => x.shifter === 'theta')) expect(d.powerW).toBeCloseTo(0.022, 12);
    for (const d of sut.drives.filter((x) => x.shifter === 'phi')) expect(d.powerW).toBe(0);
    expect(sut.totalPowerW).toBeCloseTo(gateCount * 0.022, 10);
    expect(sut.approval).toBe('not approved');
    expect(sut.cautions).toEqual(BENCH_CAUTIONS);
  });

  it('needs no power for cross-parked gates, and uses a calibration row where one is given', async () => {
    const configuration = emptyConfiguration(chip, 'cross');
    const firstGate = buildMesh(chip).gates[0]?.id ?? '';
    const sut = await exportOf(configuration, [{ gate: firstGate, shifter: 'theta', offsetRad: -Math.PI / 2, piPowerW: 0.02, resistanceOhm: 1000, maxPowerW: 0.08, maxVoltageV: 12 }]);
    const calibrated = sut.drives.find((d) => d.gate === firstGate && d.shifter === 'theta');
    // theta = 0 with offset -pi/2: the heater adds pi/2, P = 0.02 W * (pi/2) / pi = 10 mW (common practice).
    expect(calibrated).toMatchObject({ source: 'calibration' });
    expect(calibrated?.powerW).toBeCloseTo(0.01, 12);
    expect(sut.totalPowerW).toBeCloseTo(0.01, 12);
  });

  it('refuses when a drive exceeds its limit, listing each shifter', async () => {
    const tight = { ...chip, technology: { ...chip.technology, phaseShifter: { ...chip.technology.phaseShifter, maxPowerW: 0.01 } } };
    const result = await buildBenchExport({ configuration: emptyConfiguration(tight, 'bar'), calibration: [], ...meta });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.violations).toHaveLength(gateCount);
    expect(result.violations.every((v) => v.quantity === 'power' && v.shifter === 'theta' && v.limit === 0.01)).toBe(true);
  });

  it('carries a checksum that detects an edited drive value', async () => {
    const sut = await exportOf(emptyConfiguration(chip, 'bar'));
    expect(await verifyBenchExport(sut)).toBe(true);
    const edited = { ...sut, drives: sut.drives.map((d, i) => (i === 0 ? { ...d, powerW: d.powerW * 2 } : d)) };
    expect(await verifyBenchExport(edited)).toBe(false);
  });

  it('writes a CSV with the approval, the cautions, the checksum and one row per shifter', async () => {
    const sut = await exportOf(emptyConfiguration(chip, 'bar'));
    const lines = writeBenchExportCsv(sut).trimEnd().split('\n');
    expect(lines).toContain('# approval: not approved');
    for (const c of BENCH_CAUTIONS) expect(lines).toContain(`# caution: ${c}`);
    expect(lines).toContain(`# checksum_sha256: ${sut.checksum}`);
    const header = lines.findIndex((l) => l === BENCH_EXPORT_CSV_COLUMNS.join(','));
    expect(lines.length - header - 1).toBe(2 * gateCount);
    expect(lines[header + 1]?.split('",')[1]?.split(',')[5]).toBe('22');
  });

  it('keeps a name with a newline on its own header line: no forged approval line', async () => {
    const sut = { ...(await exportOf(emptyConfiguration(chip, 'bar'))), configuration: 'notch\n# approval: approved' };
    const lines = writeBenchExportCsv(sut).trimEnd().split('\n');
    expect(lines.filter((l) => l.startsWith('# approval:'))).toEqual(['# approval: not approved']);
    expect(lines).toContain(`# chip: ${sut.chip}; configuration: notch # approval: approved; version: ${sut.version}`);
  });
});
