/** `hexloom mesh`: writes a mesh definition (rectangle, hexagon or cell list) with I/O sites, as JSON. */
import { readFileSync, writeFileSync } from 'node:fs';
import type { Command } from 'commander';
import type { z } from 'zod';
import { configurationSchema, meshDefinitionSchema, meshShapeSchema, technologyProfileSchema } from '@hexloom/contracts';
import { DEMO_TECHNOLOGY, type Configuration, type IoPreset, type MeshShape } from '@hexloom/mesh';
import { CliError } from '../cli-error.js';


/** Reads a JSON file and checks it with a schema; a CliError names the file and the first bad field. */
export function readJsonFile<T extends z.ZodType>(path: string, schema: T, what: string): z.infer<T> {
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    throw new CliError(`cannot read ${what} ${path}: ${(error as Error).message}`);
  }
  return parseJson(raw, schema, `${what} ${path}`);
}

export function parseJson<T extends z.ZodType>(raw: unknown, schema: T, what: string): z.infer<T> {
  const r = schema.safeParse(raw);
  if (!r.success) {
    const issue = r.error.issues[0]!;
    throw new CliError(`${what} is not valid: ${issue.path.join('.') || '(root)'}: ${issue.message}`);
  }
  return r.data;
}

/** The mesh library, loaded on first use so that other commands start fast. */
export const loadMeshLib = () => import('@hexloom/mesh');

/** Loads a configuration file, or a mesh definition file as an empty configuration (idle gates parked in bar). */
export function loadConfiguration(path: string): Configuration {
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    throw new CliError(`cannot read configuration ${path}: ${(error as Error).message}`);
  }
  if (raw !== null && typeof raw === 'object' && !('mesh' in raw))
    return { schemaVersion: 1, mesh: parseJson(raw, meshDefinitionSchema, `mesh definition ${path}`), parkedState: 'bar', gates: [], circuits: [] };
  return parseJson(raw, configurationSchema, `configuration ${path}`);
}

/** Writes JSON to a file or stdout. */
export function writeJson(value: unknown, out: string | undefined): void {
  const text = `${JSON.stringify(value, null, 2)}\n`;
  if (out) writeFileSync(out, text);
  else process.stdout.write(text);
}

/** Maps a MeshError (bad id, bad shape; its stable name is `MeshError`) to a one-line CLI error. */
export function meshErrors<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof Error && error.name === 'MeshError') throw new CliError(error.message);
    throw error;
  }
}

type MeshOptions = { rows?: string; columns?: string; radius?: string; cells?: string; io: string; name: string; dead?: string; technology?: string; wiredTo: string; out?: string };

export function registerMeshCommand(program: Command): void {
  program
    .command('mesh')
    .description('write a mesh definition (JSON): a rectangle of rows x columns, a hexagon of a radius, or a list of cells')
    .option('--rows <n>', 'rows of a rectangular mesh')
    .option('--columns <n>', 'columns of a rectangular mesh')
    .option('--radius <k>', 'radius of a hexagonal mesh')
    .option('--cells <file>', 'JSON file with a list of {"q","r"} cells')
    .option('--io <preset>', 'I/O sites: all, left-right or none', 'left-right')
    .option('--wired-to <kind>', 'what every I/O port is wired to: fibre, modulator, detector or none', 'fibre')
    .option('--name <name>', 'name of the mesh', 'mesh')
    .option('--dead <gates>', 'comma-separated ids of dead gates, e.g. g(2,1)e,g(3,3)nw')
    .option('--technology <file>', 'JSON technology profile (default: a placeholder profile)')
    .option('-o, --out <file>', 'write to a file instead of stdout')
    .action(async (o: MeshOptions) => {
      const { makeMeshDefinition } = await loadMeshLib();
      const int = (v: string, what: string) => {
        const n = Number(v);
        if (!Number.isInteger(n)) throw new CliError(`${what} must be a whole number, got "${v}"`);
        return n;
      };
      let shape: MeshShape;
      if (o.cells) shape = parseJson({ kind: 'cells', cells: JSON.parse(readFileSync(o.cells, 'utf8')) as unknown }, meshShapeSchema, `cell list ${o.cells}`);
      else if (o.radius !== undefined) shape = { kind: 'hexagon', radius: int(o.radius, '--radius') };
      else if (o.rows !== undefined && o.columns !== undefined) shape = { kind: 'rectangle', rows: int(o.rows, '--rows'), columns: int(o.columns, '--columns') };
      else throw new CliError('give --rows and --columns, or --radius, or --cells');
      if (!['all', 'left-right', 'none'].includes(o.io)) throw new CliError(`--io must be all, left-right or none, got "${o.io}"`);
      if (!['fibre', 'modulator', 'detector', 'none'].includes(o.wiredTo)) throw new CliError(`--wired-to must be fibre, modulator, detector or none, got "${o.wiredTo}"`);
      const technology = o.technology ? readJsonFile(o.technology, technologyProfileSchema, 'technology profile') : DEMO_TECHNOLOGY;
      const definition = meshErrors(() =>
        makeMeshDefinition({ name: o.name, shape, technology, io: o.io as IoPreset, wiredTo: o.wiredTo as 'fibre', deadGates: o.dead ? o.dead.split(/,(?=\s*g\()/).map((s) => s.trim()) : [] }),
      );
      writeJson(parseJson(definition, meshDefinitionSchema, 'generated mesh definition'), o.out);
    });
}
