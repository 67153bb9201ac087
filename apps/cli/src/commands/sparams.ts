/** `hexloom sparams`: the S-matrix of a configured chip between chosen ports, as Touchstone or JSON. */
import type { Command } from 'commander';
import { S_PARAMETERS_SCHEMA_VERSION, sParametersFileSchema } from '@hexloom/contracts';
import { sMatrix, writeTouchstone, type TouchstoneFormat, type TouchstoneVersion } from '@hexloom/solver';
import { CliError } from '../cli-error.js';
import { emit, loadChip, parseGrid, portLabel, resolvePort, warn } from './simulate.js';

/**
 * The ports of a `--ports` list: separated by `;`, or by commas outside parentheses, since a port id holds commas
 * inside its coordinates (`v(-1,0)n/g(-1,-1)e`) and a label holds none (`W03`). Blank entries are dropped.
 */
export function splitPortList(list: string): string[] {
  const out: string[] = [];
  let depth = 0, start = 0;
  for (let i = 0; i <= list.length; i++) {
    const c = list[i];
    if (c === '(') depth++;
    else if (c === ')') depth = Math.max(0, depth - 1);
    else if (c === undefined || c === ';' || (c === ',' && depth === 0)) {
      const name = list.slice(start, i).trim();
      if (name !== '') out.push(name);
      start = i + 1;
    }
  }
  return out;
}

type SparamsOptions = { ports?: string; span?: string; points: string; format: string; touchstone: string; data: string; out?: string };

export function registerSparamsCommand(program: Command): void {
  program
    .command('sparams')
    .description('S-parameters of a configuration between chosen ports (Touchstone .sNp or JSON)')
    .argument('<configuration>', 'configuration JSON file (embeds its mesh definition)')
    .option('--ports <list>', 'ports (ids or labels) separated by commas or ;, in Touchstone port order, e.g. "v(-1,0)n/g(-1,-1)e,W03" (default: every port)')
    .option('--span <start:stop>', 'frequency offsets from the reference, GHz (default: one whole unit FSR)')
    .option('--points <n>', 'number of frequency points', '256')
    .option('--format <format>', 'touchstone or json', 'touchstone')
    .option('--touchstone <version>', 'Touchstone version, 1.1 or 2.0', '1.1')
    .option('--data <format>', 'Touchstone data format: MA, DB or RI', 'MA')
    .option('-o, --out <file>', 'write to a file instead of stdout (e.g. chip.s4p)')
    .action((path: string, options: SparamsOptions) => {
      const chip = loadChip(path);
      const ports = options.ports !== undefined ? splitPortList(options.ports).map((p) => resolvePort(chip, p)) : [...chip.netlist.inputPorts];
      if (ports.length === 0) throw new CliError(`--ports names no port: "${options.ports ?? ''}"`);
      if (new Set(ports).size !== ports.length) throw new CliError(`--ports lists a port twice: ${options.ports ?? ''}`);
      const grid = parseGrid(options.span, options.points);
      const s = sMatrix(chip.netlist, { ports, grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
      warn(s.runs.map((r) => r.warning));
      const frequenciesHz = s.offsetsHz.map((f) => s.referenceFrequencyHz + f);
      if (options.format === 'json') {
        const P = ports.length;
        const cube = (v: Float64Array) => [...frequenciesHz].map((_, f) => ports.map((_, i) => ports.map((_, j) => v[(f * P + i) * P + j] ?? 0)));
        const file = sParametersFileSchema.parse({
          schemaVersion: S_PARAMETERS_SCHEMA_VERSION,
          kind: 'hexloom-sparameters',
          ports,
          referenceOhm: 50,
          referenceFrequencyHz: s.referenceFrequencyHz,
          frequencyHz: [...frequenciesHz],
          re: cube(s.re),
          im: cube(s.im),
          runs: s.runs,
        });
        emit(`${JSON.stringify(file)}\n`, options.out);
        return;
      }
      if (options.format !== 'touchstone') throw new CliError(`--format must be touchstone or json, got "${options.format}"`);
      if (options.touchstone !== '1.1' && options.touchstone !== '2.0') throw new CliError(`--touchstone must be 1.1 or 2.0, got "${options.touchstone}"`);
      const data = options.data.toUpperCase();
      if (data !== 'MA' && data !== 'DB' && data !== 'RI') throw new CliError(`--data must be MA, DB or RI, got "${options.data}"`);
      const comments = ['hexloom sparams', ...ports.map((p, i) => `port ${i + 1} = ${portLabel(chip, p)}${portLabel(chip, p) === p ? '' : ` (${p})`}`)];
      emit(
        writeTouchstone({ portCount: ports.length, frequenciesHz, re: s.re, im: s.im, referenceOhm: 50 }, { version: options.touchstone as TouchstoneVersion, format: data as TouchstoneFormat, comments }),
        options.out,
      );
    });
}
