/** `hexloom yield`: seeded Monte Carlo of coupler and phase errors on worker threads, against the spec's mask. */
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { Command } from 'commander';
import { SingleBar, Presets } from 'cli-progress';
import { Piscina } from 'piscina';
import { filterSpecSchema, type FilterSpec } from '@hexloom/contracts';
import { buildMesh, type Configuration, type Mesh } from '@hexloom/mesh';
import { designCircuit, gateSensitivities, MONTE_CARLO_DENSITY, type YieldChunkTask, planMonteCarlo, summariseMonteCarlo, verificationOffsets, type MaskRegion, type MonteCarloRun, type ToleranceModel } from '@hexloom/synth';
import { CliError } from '../cli-error.js';
import { loadConfiguration, meshErrors, readJsonFile, writeJson } from './mesh.js';

type YieldOptions = { circuit?: string; spec: string; runs: string; seed: string; chunk: string; threads?: string; couplerSigma?: string; phaseSigma?: string; sensitivity?: boolean; out?: string; quiet?: boolean };

/** The circuit a spec was made for: the one whose ports include the spec's input (by id or label). */
export function circuitOfSpec(configuration: Configuration, mesh: Mesh, spec: FilterSpec): string {
  const input = mesh.ports[mesh.portIndex.get(spec.spec.from) ?? -1]?.id ?? spec.spec.from;
  const found = configuration.circuits.find((c) => c.ports.includes(input));
  if (!found) throw new CliError(`no circuit of the configuration uses the spec's input ${spec.spec.from}; name it with --circuit`);
  return found.id;
}

/** The input and the observed output of a specification (the filtered output for filters, the first branch for delay sets). */
export function observedPorts(spec: FilterSpec): { from: string; to: string } {
  const s = spec.spec;
  switch (s.kind) {
    case 'ttd-set':
      return { from: s.from, to: s.outputs[0] as string };
    case 'add-drop':
      return { from: s.from, to: s.drop };
    default:
      return { from: s.from, to: s.to };
  }
}

/** Spreads used when neither the chip's technology profile nor the command line gives them (demo figures). */
export const DEFAULT_TOLERANCE: ToleranceModel = { couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 };

const positiveInt = (value: string, name: string, max: number): number => {
  const n = Number(value);
  if (!(Number.isInteger(n) && n >= 1 && n <= max)) throw new CliError(`--${name} must be an integer from 1 to ${max}, got "${value}"`);
  return n;
};
const sigma = (value: string, name: string): number => {
  const x = Number(value);
  if (!(Number.isFinite(x) && x >= 0 && x < 1)) throw new CliError(`--${name} must be a standard deviation in radians in [0, 1), got "${value}"`);
  return x;
};

export function registerYieldCommand(program: Command): void {
  program
    .command('yield')
    .description('Monte Carlo yield of a configuration against its specification: every output, mask and targets (coupler and phase errors, seeded, on all cores)')
    .argument('<configuration>', 'configuration JSON file (e.g. written by hexloom synth)')
    .requiredOption('--spec <file>', 'specification JSON file: every output is checked against its mask regions and the spec\'s own targets')
    .option('--circuit <id>', 'circuit the spec describes (default: the one whose ports include the spec\'s input)')
    .option('--runs <n>', 'number of Monte Carlo runs', '1000')
    .option('--seed <n>', 'seed of the random streams; each run draws from its own stream of (seed, run number), so the same seed gives the same result', '1')
    .option('--chunk <n>', 'runs per chunk of work (one chunk per worker task); the result does not depend on it', '25')
    .option('--threads <n>', 'worker threads (default: all cores); the result does not depend on it')
    .option('--coupler-sigma <rad>', "standard deviation of each 3 dB coupler splitting angle, rad (default: the chip's technology tolerance, else 0.01)")
    .option('--phase-sigma <rad>', "standard deviation of each gate phase, rad (default: the chip's technology tolerance, else 0.02)")
    .option('--sensitivity', 'also list the gates whose errors move the mask margin most')
    .option('-o, --out <file>', 'write the JSON summary to a file instead of stdout')
    .option('--quiet', 'no progress bar')
    .action(async (configurationPath: string, o: YieldOptions) => {
      const spec = readJsonFile(o.spec, filterSpecSchema, 'specification');
      const configuration = loadConfiguration(configurationPath);
      const mesh = meshErrors(() => buildMesh(configuration.mesh));
      const runs = positiveInt(o.runs, 'runs', 1_000_000);
      const chunkSize = positiveInt(o.chunk, 'chunk', 100_000);
      const seed = Number(o.seed);
      if (!Number.isInteger(seed)) throw new CliError(`--seed must be an integer, got "${o.seed}"`);
      const threads = o.threads === undefined ? availableParallelism() : positiveInt(o.threads, 'threads', 256);
      const fromChip = configuration.mesh.technology.tolerance;
      const tolerance: ToleranceModel = {
        couplerSigmaRad: o.couplerSigma === undefined ? (fromChip?.couplerSigmaRad ?? DEFAULT_TOLERANCE.couplerSigmaRad) : sigma(o.couplerSigma, 'coupler-sigma'),
        phaseSigmaRad: o.phaseSigma === undefined ? (fromChip?.phaseSigmaRad ?? DEFAULT_TOLERANCE.phaseSigmaRad) : sigma(o.phaseSigma, 'phase-sigma'),
      };
      const { from, to } = observedPorts(spec);
      const circuitId = o.circuit ?? circuitOfSpec(configuration, mesh, spec);
      const mask = spec.mask.regions as MaskRegion[];
      const { design, unitDelayS } = designCircuit(spec.spec, configuration.mesh.technology);
      const offsetsHz = verificationOffsets(design, mask, unitDelayS, MONTE_CARLO_DENSITY);
      const portId = (name: string): string => mesh.ports[mesh.portIndex.get(name) ?? -1]?.id ?? name;
      const chunks = planMonteCarlo({ runs, seed, chunkSize });
      const pool = new Piscina<YieldChunkTask, MonteCarloRun[]>({ filename: fileURLToPath(new URL('../workers/yield-worker.js', import.meta.url)), maxThreads: threads, minThreads: Math.min(threads, chunks.length) });
      const bar = o.quiet ? null : new SingleBar({ format: 'yield |{bar}| {value}/{total} runs | {eta_formatted} left', stream: process.stderr }, Presets.shades_classic);
      bar?.start(runs, 0);
      const started = performance.now();
      try {
        const results = await Promise.all(
          chunks.map(async (chunk) => {
            const part = await pool.run({ configuration, spec, circuitId, tolerance, chunk });
            bar?.increment(chunk.count);
            return part;
          }),
        );
        bar?.stop();
        const seconds = (performance.now() - started) / 1000;
        const summary = summariseMonteCarlo(results.flat());
        const sensitivity = o.sensitivity ? gateSensitivities({ mesh, configuration, from: portId(from), to: portId(to), offsetsHz, mask, tolerance }).slice(0, 10) : undefined;
        writeJson({ spec: spec.name, circuit: circuitId, from, to, seed, tolerance, threads, seconds, runsPerSecond: runs / seconds, ...summary, ...(sensitivity ? { sensitivity } : {}) }, o.out);
        process.stderr.write(`yield ${(100 * summary.yield).toFixed(1)} % +/- ${(100 * summary.yieldStdError).toFixed(1)} % over ${runs} runs (${(runs / seconds).toFixed(0)} runs/s on ${threads} threads)\n`);
      } finally {
        bar?.stop();
        await pool.destroy();
      }
    });
}
