/** `hexloom version`: prints the product version (and, with --json, the runtime). */
import type { Command } from 'commander';
import { HEXLOOM_VERSION } from '@hexloom/contracts';

export function registerVersionCommand(program: Command): void {
  program
    .command('version')
    .description('print the Hexloom version')
    .option('--json', 'print a JSON object with the version and the Node.js runtime')
    .action((options: { json?: boolean }) => {
      if (options.json) process.stdout.write(`${JSON.stringify({ hexloom: HEXLOOM_VERSION, node: process.version })}\n`);
      else process.stdout.write(`hexloom ${HEXLOOM_VERSION}\n`);
    });
}
