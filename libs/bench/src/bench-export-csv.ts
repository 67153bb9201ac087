/** The CSV form of a bench export: `#` header lines (approval, cautions, checksum), then one row per shifter. */
import type { BenchExport } from './bench-export.js';

/** Columns of the bench export CSV, in order. */
export const BENCH_EXPORT_CSV_COLUMNS = ['gate', 'state', 'kappa', 'phase_rad', 'shifter', 'target_phase_rad', 'power_mw', 'voltage_v', 'current_ma', 'source'] as const;

const num = (x: number): string => Number(x.toPrecision(10)).toString();

/** Text for a `#` header line: control characters (a newline would start a forged line) become spaces. */
const oneLine = (text: string): string => text.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, ' ');

/** Writes the export as CSV (RFC 4180, comma, LF, gate ids quoted); the checksum line is the JSON form's checksum. */
export function writeBenchExportCsv(exported: BenchExport): string {
  const gates = new Map(exported.gates.map((g) => [g.gate, g]));
  const lines = [
    `# hexloom bench export, schema version ${exported.schemaVersion}`,
    `# chip: ${oneLine(exported.chip)}; configuration: ${oneLine(exported.configuration)}; version: ${exported.version}`,
    `# approval: ${exported.approval}`,
    ...exported.cautions.map((c) => `# caution: ${oneLine(c)}`),
    `# parked_state: ${exported.parkedState}`,
    `# total_power_w: ${num(exported.totalPowerW)}`,
    `# checksum_sha256: ${exported.checksum}`,
    BENCH_EXPORT_CSV_COLUMNS.join(','),
  ];
  for (const d of exported.drives) {
    const g = gates.get(d.gate);
    const state = g?.state ?? exported.parkedState;
    const kappa = g?.kappa ?? (state === 'cross' ? 1 : state === 'bar' ? 0 : 0.5);
    lines.push([`"${d.gate}"`, state, num(kappa), num(g?.phaseRad ?? 0), d.shifter, num(d.targetPhaseRad), num(d.powerW * 1e3), num(d.voltageV), num(d.currentA * 1e3), d.source].join(','));
  }
  return `${lines.join('\n')}\n`;
}
