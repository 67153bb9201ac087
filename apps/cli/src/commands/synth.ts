/** `hexloom synth`: designs, places, tunes and verifies a specification on a chip; writes the new configuration. */
import type { Command } from 'commander';
import { filterSpecSchema } from '@hexloom/contracts';
import { buildMesh, type Configuration } from '@hexloom/mesh';
import { synthesise, type SynthesisSuccess } from '@hexloom/synth';
import { CliError } from '../cli-error.js';
import { loadConfiguration, meshErrors, readJsonFile, writeJson } from './mesh.js';

/** Exit code when the specification cannot be realised (the reason is printed as JSON on stdout). */
export const SYNTH_FAILED_EXIT_CODE = 2;
/** Exit code when the circuit was placed but misses its mask (the configuration is still written). */
export const MASK_MISSED_EXIT_CODE = 3;

type SynthOptions = { chip: string; into?: string; id?: string; out?: string; report?: string };

/** A figure with its unit read from its name (…Hz in GHz, …Ps in ps, …Db in dB). */
function formatFigure(name: string, value: number): string {
  if (name.endsWith('PsPerGHz')) return `${value.toFixed(3)} ps/GHz`;
  if (name.endsWith('Hz')) return `${(value / 1e9).toFixed(4)} GHz`;
  if (name.endsWith('Ps')) return `${value.toFixed(2)} ps`;
  if (name.endsWith('Db')) return `${value.toFixed(2)} dB`;
  return value.toPrecision(6);
}

const formatCheck = (value: number, unit: string): string => (unit === 'Hz' ? `${(value / 1e9).toFixed(4)} GHz` : `${value.toFixed(3)} ${unit}`);

/** A one-screen summary of what was designed, changed, and how the mask went. */
export function synthSummary(result: SynthesisSuccess): string {
  const lines = [`placed ${result.design.kind} ${result.circuit.id}: ${result.circuit.paths.length} paths, ${result.circuit.couplers.length} couplers, FSR ${(result.fsrHz / 1e9).toFixed(3)} GHz`];
  if (result.circuit.couplers.length > 0) lines.push(`  couplers (kappa): ${result.circuit.couplers.map((c) => `${c.gate}=${c.kappa.toFixed(4)}`).join(', ')}`);
  for (const t of result.tunings) lines.push(`  loop of ${t.lengthUnits} units tuned by ${t.gate}: phase ${t.phaseRad.toFixed(4)} rad`);
  for (const n of result.notes) lines.push(`  note: ${n.quantity} ${n.requested === null ? '' : `asked ${n.requested.toPrecision(6)} `}got ${n.achieved.toPrecision(6)} ${n.unit} (${n.note})`);
  for (const v of result.verification) {
    lines.push(`  ${v.fromName} -> ${v.toName} (${v.role}): ${Object.entries(v.figures).map(([name, value]) => `${name} ${formatFigure(name, value)}`).join(', ')}`);
    for (const c of v.mask.checks) lines.push(`    ${c.kind === 'target' ? 'target' : `mask ${c.kind}`} ${c.quantity}: ${c.pass ? 'pass' : 'FAIL'} (measured ${formatCheck(c.measured, c.unit)}, limit ${formatCheck(c.limit, c.unit)}, margin ${formatCheck(c.margin, c.unit)}, worst at ${(c.worstFrequencyHz / 1e9).toFixed(3)} GHz)`);
  }
  lines.push(result.verdict.pass ? `  verdict: pass (${result.verdict.checkCount} checks on ${result.verification.length} outputs)` : `  verdict: FAIL (${result.verdict.failed.length} of ${result.verdict.checkCount} checks: ${result.verdict.failed.map((c) => `${c.quantity} at ${c.toName}`).join('; ')})`);
  return `${lines.join('\n')}\n`;
}

/** The JSON report of a synthesis: design numbers, notes, tunings, figures and mask checks (spectra left out). */
export function synthReport(result: SynthesisSuccess): unknown {
  return {
    circuit: result.circuit.id,
    fsrHz: result.fsrHz,
    design: result.design,
    notes: result.notes,
    tunings: result.tunings,
    verdict: result.verdict,
    ...(result.basePs !== undefined ? { basePs: result.basePs } : {}),
    verification: result.verification.map((v) => ({ from: v.from, fromName: v.fromName, to: v.to, toName: v.toName, role: v.role, figures: v.figures, mask: v.mask, impulseSteps: v.response.steps, residualEnergy: v.response.residualEnergy, warning: v.response.warning })),
  };
}

export function registerSynthCommand(program: Command): void {
  program
    .command('synth')
    .description('synthesise a specification (filter, delay, delay set) onto a chip: design, place, tune, simulate and check the mask')
    .argument('<spec>', 'specification JSON file (see docs/formats.md)')
    .requiredOption('--chip <file>', 'mesh definition (or configuration) JSON file of the chip')
    .option('--into <file>', 'configuration to add the circuit to (default: the chip with no circuits)')
    .option('--id <name>', 'id of the new circuit (default: from the spec kind)')
    .option('-o, --out <file>', 'write the configuration to a file instead of stdout')
    .option('--report <file>', 'write a JSON report of the design and its verification')
    .action((specPath: string, o: SynthOptions) => {
      const spec = readJsonFile(specPath, filterSpecSchema, 'specification');
      const chip = loadConfiguration(o.chip);
      const configuration: Configuration = o.into ? loadConfiguration(o.into) : chip;
      if (o.into && JSON.stringify(configuration.mesh.shape) !== JSON.stringify(chip.mesh.shape)) {
        throw new CliError(`--into ${o.into} is a configuration of another chip (shape differs from ${o.chip})`);
      }
      const mesh = meshErrors(() => buildMesh(configuration.mesh));
      const circuitId = o.id ?? `${spec.spec.kind}-${configuration.circuits.length + 1}`;
      const result = synthesise({ spec, mesh, configuration, circuitId });
      if (!result.ok) {
        process.stdout.write(`${JSON.stringify(result)}\n`);
        throw new CliError(`cannot realise ${spec.name}: ${result.reason}: ${result.message}`, SYNTH_FAILED_EXIT_CODE);
      }
      writeJson(result.configuration, o.out);
      if (o.report) writeJson(synthReport(result), o.report);
      process.stderr.write(synthSummary(result));
      if (!result.verdict.pass) {
        throw new CliError(`${spec.name}: the placed circuit misses ${result.verdict.failed.length} of its ${result.verdict.checkCount} mask and target checks (configuration written)`, MASK_MISSED_EXIT_CODE);
      }
    });
}
