/** Builds the bench export: gate states and drive values from the calibration, total power, checksum. */
import { buildMesh, type Configuration, type GateSetting } from '@hexloom/mesh';
import { BENCH_CAUTIONS } from './cautions.js';
import { canonicalJson } from './canonical-json.js';
import { driveForPhase, type DriveViolation } from './drive-value.js';
import { shifterKey, type ShifterCalibration } from './shifter-calibration.js';
import { shifterTargets } from './shifter-targets.js';
import { sha256Hex } from './web-crypto.js';

/** Version of the bench export format. */
export const BENCH_EXPORT_SCHEMA_VERSION = 1 as const;

/** One drive row of the export. */
export type BenchDrive = {
  readonly gate: string;
  readonly shifter: ShifterCalibration['shifter'];
  readonly targetPhaseRad: number;
  readonly powerW: number;
  readonly voltageV: number;
  readonly currentA: number;
  readonly source: 'calibration' | 'profile';
};

/** The bench export (JSON form; see docs/formats.md, "Bench export"). */
export type BenchExport = {
  readonly schemaVersion: typeof BENCH_EXPORT_SCHEMA_VERSION;
  readonly kind: 'hexloom-bench-export';
  readonly chip: string;
  readonly configuration: string;
  readonly version: number;
  readonly approved: boolean;
  readonly approval: 'approved' | 'not approved';
  readonly cautions: readonly string[];
  readonly parkedState: Configuration['parkedState'];
  readonly gates: readonly GateSetting[];
  readonly drives: readonly BenchDrive[];
  readonly totalPowerW: number;
  readonly checksum: string;
};

/** What the export is of. */
export type BenchExportInput = {
  readonly configuration: Configuration;
  readonly calibration: readonly ShifterCalibration[];
  readonly chip: string;
  readonly configurationName: string;
  readonly version: number;
  readonly approved: boolean;
};

/** The export, or every shifter whose drive would exceed its limit. */
export type BenchExportResult = { readonly ok: true; readonly export: BenchExport } | { readonly ok: false; readonly violations: readonly DriveViolation[] };

/**
 * Computes the drive of every phase shifter of every live gate (calibration row when there is one, else
 * the chip's technology profile with zero offset) and the total electrical power. Refuses, listing each
 * shifter, when any drive exceeds its power or voltage limit. The checksum is the SHA-256 of the canonical
 * JSON of every other field.
 */
export async function buildBenchExport(input: BenchExportInput): Promise<BenchExportResult> {
  const { configuration } = input;
  const mesh = buildMesh(configuration.mesh);
  const profile = configuration.mesh.technology.phaseShifter;
  const rows = new Map(input.calibration.map((c) => [shifterKey(c.gate, c.shifter), c]));
  const drives: BenchDrive[] = [];
  const violations: DriveViolation[] = [];
  for (const target of shifterTargets(mesh, configuration)) {
    const row = rows.get(shifterKey(target.gate, target.shifter));
    const calibration: ShifterCalibration = row ?? { gate: target.gate, shifter: target.shifter, offsetRad: 0, ...profile };
    const drive = driveForPhase(calibration, target.phaseRad);
    violations.push(...drive.violations);
    drives.push({
      gate: drive.gate,
      shifter: drive.shifter,
      targetPhaseRad: drive.targetPhaseRad,
      powerW: drive.powerW,
      voltageV: drive.voltageV,
      currentA: drive.currentA,
      source: row ? 'calibration' : 'profile',
    });
  }
  if (violations.length > 0) return { ok: false, violations };
  const body = {
    schemaVersion: BENCH_EXPORT_SCHEMA_VERSION,
    kind: 'hexloom-bench-export' as const,
    chip: input.chip,
    configuration: input.configurationName,
    version: input.version,
    approved: input.approved,
    approval: input.approved ? ('approved' as const) : ('not approved' as const),
    cautions: [...BENCH_CAUTIONS],
    parkedState: configuration.parkedState,
    gates: [...configuration.gates],
    drives,
    totalPowerW: drives.reduce((sum, d) => sum + d.powerW, 0),
  };
  return { ok: true, export: { ...body, checksum: await sha256Hex(canonicalJson(body)) } };
}

/** Recomputes the checksum of an export and tells whether it matches (detects edited files). */
export async function verifyBenchExport(exported: BenchExport): Promise<boolean> {
  const { checksum, ...body } = exported;
  return (await sha256Hex(canonicalJson(body))) === checksum;
}
