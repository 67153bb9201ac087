/** `hexloom simulate`: the response of a configured chip from one port to another, as CSV, JSON or Touchstone. */
import { writeFileSync } from 'node:fs';
import type { Command } from 'commander';
import { configurationSchema, spectrumFileSchema, type SpectrumFile } from '@hexloom/contracts';
import { buildMesh, type Configuration } from '@hexloom/mesh';
import {
  netlistFromMesh,
  sMatrix,
  simulateConnection,
  toSpectrumFile,
  writeSpectrumCsv,
  writeTouchstone,
  type ConnectionResult,
  type FrequencyGrid,
  type MeshNetlist,
} from '@hexloom/solver';
import { CliError } from '../cli-error.js';
import { readJsonFile } from './mesh.js';

/** Reads, checks and compiles a configuration file into a solver netlist (every gate of the chip). */
export function loadChip(path: string): MeshNetlist {
  const configuration = readJsonFile(path, configurationSchema, 'configuration') as Configuration;
  try {
    return netlistFromMesh({ mesh: buildMesh(configuration.mesh), configuration });
  } catch (error) {
    throw new CliError((error as Error).message);
  }
}

/** A port given by id or label, as the netlist names it. */
export function resolvePort(chip: MeshNetlist, name: string): string {
  const id = chip.portIdOf.get(name);
  if (!id) throw new CliError(`unknown port "${name}" (ports: ${[...chip.portIdOf.keys()].join(', ')})`);
  return id;
}

/** `--span start:stop` in GHz offsets from the reference frequency, else the whole unit FSR. */
export function parseGrid(span: string | undefined, points: string): FrequencyGrid {
  const n = Number(points);
  if (!(Number.isInteger(n) && n >= 1 && n <= 4_194_304)) throw new CliError(`--points must be an integer from 1 to 4194304, got "${points}"`);
  if (span === undefined) return { kind: 'fsr', points: n };
  const m = /^(-?[\d.]+(?:e-?\d+)?):(-?[\d.]+(?:e-?\d+)?)$/i.exec(span);
  const a = Number(m?.[1]), b = Number(m?.[2]);
  if (!m || !Number.isFinite(a) || !Number.isFinite(b) || b < a) throw new CliError(`--span must be START:STOP in GHz with START <= STOP, got "${span}"`);
  return { kind: 'span', startOffsetHz: a * 1e9, stopOffsetHz: b * 1e9, points: n };
}

/** Writes to a file or to stdout. */
export function emit(text: string, out: string | undefined): void {
  if (out) writeFileSync(out, text);
  else process.stdout.write(text);
}

/** The chip's name of a port id: its label when it has one (the names map holds labels and ids), else the id. */
export function portLabel(chip: MeshNetlist, id: string): string {
  for (const [name, target] of chip.portIdOf) if (target === id && name !== id) return name;
  return id;
}

/** The JSON spectrum file of a connection, checked against the contracts schema before it is written. */
export function spectrumFile(result: ConnectionResult, chip?: MeshNetlist): SpectrumFile {
  return spectrumFileSchema.parse(toSpectrumFile(result, chip ? { from: portLabel(chip, result.from), to: portLabel(chip, result.to) } : undefined));
}

type SimulateOptions = { from: string; to: string; span?: string; points: string; format: string; out?: string };

export function registerSimulateCommand(program: Command): void {
  program
    .command('simulate')
    .description('simulate a configuration from one port to another: amplitude, phase, group delay, dispersion')
    .argument('<configuration>', 'configuration JSON file (embeds its mesh definition)')
    .requiredOption('--from <port>', 'input port (id or label)')
    .requiredOption('--to <port>', 'output port (id or label)')
    .option('--span <start:stop>', 'frequency offsets from the reference, GHz (default: one whole unit FSR)')
    .option('--points <n>', 'number of frequency points', '1024')
    .option('--format <format>', 'csv, json or s2p (Touchstone 1.1 between --from and --to)', 'csv')
    .option('-o, --out <file>', 'write to a file instead of stdout')
    .action((path: string, options: SimulateOptions) => {
      const chip = loadChip(path);
      const from = resolvePort(chip, options.from), to = resolvePort(chip, options.to);
      const grid = parseGrid(options.span, options.points);
      const base = { grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz };
      if (options.format === 's2p') {
        if (from === to) throw new CliError('an s2p file needs two different ports');
        const s = sMatrix(chip.netlist, { ...base, ports: [from, to] });
        const frequenciesHz = s.offsetsHz.map((f) => s.referenceFrequencyHz + f);
        emit(writeTouchstone({ portCount: 2, frequenciesHz, re: s.re, im: s.im, referenceOhm: 50 }, { comments: [`hexloom simulate: port 1 = ${from}, port 2 = ${to}`] }), options.out);
        warn(s.runs.map((r) => r.warning));
        return;
      }
      if (options.format !== 'csv' && options.format !== 'json') throw new CliError(`--format must be csv, json or s2p, got "${options.format}"`);
      const result = simulateConnection(chip.netlist, { ...base, from, to });
      warn([result.run.warning]);
      if (options.format === 'json') emit(`${JSON.stringify(spectrumFile(result, chip))}\n`, options.out);
      else emit(writeSpectrumCsv(result.spectrum, [`hexloom simulate from ${from} to ${to}`, `impulse steps ${result.run.steps}, residual energy ${result.run.residualEnergy.toExponential(2)}`]), options.out);
    });
}

/** Prints solver warnings (a loop that does not decay) on stderr; the result is still written. */
export function warn(warnings: readonly (string | null)[]): void {
  for (const w of warnings) if (w) process.stderr.write(`hexloom: warning: ${w}\n`);
}
