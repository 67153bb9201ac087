/** Every command of the CLI; each module adds its own subcommands to the program. */
import type { Command } from 'commander';
import { registerVersionCommand } from './version.js';
import { registerMeshCommand } from './mesh.js';
import { registerRouteCommand } from './route.js';
import { registerCheckCommand } from './check.js';
import { registerSimulateCommand } from './simulate.js';
import { registerSparamsCommand } from './sparams.js';
import { registerSynthCommand } from './synth.js';
import { registerYieldCommand } from './yield.js';
import { registerWorkerCommand } from './worker.js';

/** A function that adds one or more subcommands to the program. */
export type RegisterCommand = (program: Command) => void;

export const COMMANDS: readonly RegisterCommand[] = [registerVersionCommand, registerMeshCommand, registerRouteCommand, registerCheckCommand, registerSimulateCommand, registerSparamsCommand, registerSynthCommand, registerYieldCommand, registerWorkerCommand];
