/** @hexloom/contracts: zod schemas and types shared by server, web and CLI. */
export * from './roles.js';
export * from './user.js';
export * from './team.js';
export * from './errors.js';
export * from './health.js';
export * from './auth.js';
export * from './version.js';
export * from './mesh/index.js';
export * from './synth/index.js';
export * from './solver/index.js';
export * from './team-server/index.js';
export * from './plain-text.js';
