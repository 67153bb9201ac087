/** @hexloom/bench: calibration, drive values and exchange with the lab bench (pure, portable). */
export { BENCH_CAUTIONS } from './cautions.js';
export { BenchInputError } from './bench-input-error.js';
export { shifterKey } from './shifter-calibration.js';
export type { ShifterCalibration, ShifterKind } from './shifter-calibration.js';
export { CALIBRATION_COLUMN_RANGES, CALIBRATION_COLUMNS, CalibrationCsvError, parseCalibrationCsv, writeCalibrationCsv } from './calibration-csv.js';
export type { CalibrationCsvOptions, CalibrationIssue } from './calibration-csv.js';
export { driveForPhase, wrapPhaseRad } from './drive-value.js';
export type { DriveValue, DriveViolation } from './drive-value.js';
export { shifterTargets } from './shifter-targets.js';
export type { ShifterTarget } from './shifter-targets.js';
export { canonicalJson } from './canonical-json.js';
export { sha256Hex } from './web-crypto.js';
export { BENCH_EXPORT_SCHEMA_VERSION, buildBenchExport, verifyBenchExport } from './bench-export.js';
export type { BenchDrive, BenchExport, BenchExportInput, BenchExportResult } from './bench-export.js';
export { BENCH_EXPORT_CSV_COLUMNS, writeBenchExportCsv } from './bench-export-csv.js';
export { compareSpectra } from './compare-spectra.js';
export type { PowerSpectrum, SpectrumComparison } from './compare-spectra.js';
