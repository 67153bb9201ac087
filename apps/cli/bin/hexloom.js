#!/usr/bin/env node
// Entry point of the hexloom command: loads the TypeScript sources through tsx's loader.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/main.ts');
process.exitCode = await main(process.argv);
