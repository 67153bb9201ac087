/** The Drizzle database handle type and its injection token. */
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from './schema/index.js';

/** The typed Drizzle handle used by every repository and service: embedded PGlite or a PostgreSQL server (node-postgres). */
export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;

/** Injection token under which the Drizzle handle is provided. */
export const DATABASE = Symbol('hexloom:database');

/** A Drizzle handle or an open transaction on it; services accept either so callers can compose. */
export type DbExecutor = Database | Parameters<Parameters<Database['transaction']>[0]>[0];
