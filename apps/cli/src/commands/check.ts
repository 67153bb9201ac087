/** `hexloom check`: lists every violation of a configuration as JSON (or one line each with --text). */
import type { Command } from 'commander';
import { CliError } from '../cli-error.js';
import { loadConfiguration, loadMeshLib, meshErrors } from './mesh.js';

/** Exit code when the configuration has violations. */
export const CHECK_FAILED_EXIT_CODE = 3;

export function registerCheckCommand(program: Command): void {
  program
    .command('check')
    .description('check a configuration: waveguides used twice, inconsistent states, dead gates, ports used twice, broken circuits')
    .argument('<configuration>', 'configuration JSON file')
    .option('--text', 'print one line per violation instead of JSON')
    .action(async (path: string, o: { text?: boolean }) => {
      const { buildMesh, checkConfiguration } = await loadMeshLib();
      const configuration = loadConfiguration(path);
      const result = meshErrors(() => checkConfiguration(buildMesh(configuration.mesh), configuration));
      if (o.text) process.stdout.write(result.ok ? 'ok: no violations\n' : result.violations.map((v) => `${v.code}: ${v.message}\n`).join(''));
      else process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
      if (!result.ok) throw new CliError(`${result.violations.length} violation(s) in ${path}`, CHECK_FAILED_EXIT_CODE);
    });
}
