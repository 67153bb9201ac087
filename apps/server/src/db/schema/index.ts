/** Every table of the Hexloom database, for drizzle's typed query builder. */
export * from './users.js';
export * from './teams.js';
export * from './memberships.js';
export * from './sessions.js';
export * from './invitations.js';
export * from './audit-events.js';
