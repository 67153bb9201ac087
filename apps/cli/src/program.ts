/** Builds the commander program with every hexloom command registered. */
import { Command } from 'commander';
import { HEXLOOM_VERSION } from '@hexloom/contracts';
import { COMMANDS } from './commands/index.js';

export function buildProgram(): Command {
  const program = new Command('hexloom')
    .description('Hexloom command line: design, route, simulate and export hexagonal waveguide mesh configurations')
    .version(HEXLOOM_VERSION, '-V, --version', 'print the version number')
    .showHelpAfterError();
  for (const register of COMMANDS) register(program);
  return program;
}
