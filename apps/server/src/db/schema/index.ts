/** Every table of the Hexloom database, for drizzle's typed query builder. */
export * from './users.js';
export * from './teams.js';
export * from './memberships.js';
export * from './sessions.js';
export * from './invitations.js';
export * from './audit-events.js';
export * from './chips.js';
export * from './calibrations.js';
export * from './configurations.js';
export * from './configuration-versions.js';
export * from './reviews.js';
export * from './comments.js';
export * from './measurements.js';
export * from './outbox-messages.js';
export * from './simulation-cache.js';
export * from './yield-jobs.js';
export * from './yield-chunk-results.js';
