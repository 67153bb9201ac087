/** Runs the hexloom command line; returns the process exit code. */
import { CommanderError } from 'commander';
import { buildProgram } from './program.js';
import { CliError } from './cli-error.js';

export async function main(argv: readonly string[]): Promise<number> {
  const program = buildProgram();
  program.exitOverride();
  try {
    await program.parseAsync([...argv]);
    return 0;
  } catch (error) {
    if (error instanceof CommanderError) return error.exitCode;
    if (error instanceof CliError) {
      process.stderr.write(`hexloom: ${error.message}\n`);
      return error.exitCode;
    }
    throw error;
  }
}
