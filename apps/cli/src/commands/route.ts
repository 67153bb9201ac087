/** `hexloom route`: adds a circuit to a configuration (or removes one) and writes the new configuration. */
import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { routeRequestSchema } from '@hexloom/contracts';
import { CliError } from '../cli-error.js';
import { loadConfiguration, loadMeshLib, meshErrors, parseJson, writeJson } from './mesh.js';

/** Exit code when a request cannot be placed (the reason is printed as JSON). */
export const ROUTE_FAILED_EXIT_CODE = 2;

type RouteOptions = { request?: string; remove?: string; out?: string };

export function registerRouteCommand(program: Command): void {
  program
    .command('route')
    .description('add a circuit to a configuration (a mesh definition counts as an empty configuration); prints the new configuration')
    .argument('<configuration>', 'configuration or mesh definition JSON file')
    .argument('[request]', 'route request JSON file (see docs/formats.md)')
    .option('--request <json>', 'the route request as inline JSON instead of a file')
    .option('--remove <circuit>', 'remove this circuit instead of adding one')
    .option('-o, --out <file>', 'write the configuration to a file instead of stdout')
    .action(async (configurationPath: string, requestPath: string | undefined, o: RouteOptions) => {
      const { buildMesh, placeCircuit, removeCircuit } = await loadMeshLib();
      const configuration = loadConfiguration(configurationPath);
      const mesh = meshErrors(() => buildMesh(configuration.mesh));
      if (o.remove) {
        writeJson(meshErrors(() => removeCircuit(configuration, o.remove!, mesh)), o.out);
        process.stderr.write(`removed circuit ${o.remove}\n`);
        return;
      }
      let raw: unknown;
      try {
        raw = JSON.parse(o.request ?? readFileSync(requestPath ?? '', 'utf8'));
      } catch (error) {
        throw new CliError(requestPath || o.request ? `cannot read the route request: ${(error as Error).message}` : 'give a route request file or --request <json>');
      }
      const request = parseJson(raw, routeRequestSchema, 'route request');
      const result = meshErrors(() => placeCircuit(configuration, request, mesh));
      if (!result.ok) {
        process.stdout.write(`${JSON.stringify(result)}\n`);
        throw new CliError(`cannot place ${request.kind} ${request.id}: ${result.reason}: ${result.message}`, ROUTE_FAILED_EXIT_CODE);
      }
      writeJson(result.configuration, o.out);
      process.stderr.write(`placed ${request.kind} ${request.id}: path lengths ${result.pathLengthsUnits.join(', ')} units\n`);
    });
}
