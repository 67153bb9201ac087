/** Opens the database — embedded PGlite (a folder or memory) or a PostgreSQL server — and applies the SQL migrations. */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import { findRepoRoot } from '../common/find-repo-root.js';
import { lockDataDir } from './data-dir-lock.js';
import type { Database } from './database.js';
import * as schema from './schema/index.js';

/** An open database: the Drizzle handle, whether it is embedded or a server, and `close` (frees the data folder too). */
export type OpenDatabase = {
  db: Database;
  mode: 'embedded' | 'server';
  close: () => Promise<void>;
  /** Runs work that only one server at a time may do on this database (the demo seed). */
  exclusive: <T>(work: () => Promise<T>) => Promise<T>;
};

/** The folder drizzle-kit generates migrations into (top-level `drizzle/`). */
export function migrationsFolder(): string {
  return join(findRepoRoot(), 'drizzle');
}

/** Key of the advisory lock that lets one server at a time migrate and seed a shared database. */
export const STARTUP_LOCK_KEY = 4_863_917;

/**
 * Opens the database in `dataDir` (created if missing, locked against a second server) or in memory for `'memory'`,
 * then applies every pending migration.
 */
export async function openDatabase(dataDir: string): Promise<OpenDatabase> {
  let client: PGlite;
  let release = (): void => {};
  if (dataDir === 'memory') {
    client = new PGlite();
  } else {
    mkdirSync(dataDir, { recursive: true });
    // PGlite is single-process: a second server on the same files loses writes and can leave them unreadable.
    release = lockDataDir(dataDir);
    client = new PGlite(join(dataDir, 'pgdata'));
  }
  const close = async (): Promise<void> => {
    try {
      if (!client.closed) await client.close();
    } finally {
      release();
    }
  };
  try {
    const db = drizzlePglite({ client, schema }) as unknown as Database;
    await migratePglite(drizzlePglite({ client, schema }), { migrationsFolder: migrationsFolder() });
    return { db, mode: 'embedded', close, exclusive: (work) => work() };
  } catch (error) {
    await close();
    throw error;
  }
}

/**
 * Opens a PostgreSQL server database through node-postgres (a pool) and applies the pending migrations under an
 * advisory lock, so several servers starting together migrate once. Several Hexloom servers may share it.
 */
export async function openServerDatabase(databaseUrl: string): Promise<OpenDatabase> {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 10 });
  const close = async (): Promise<void> => {
    if (!pool.ended) await pool.end();
  };
  try {
    const db = drizzlePg({ client: pool, schema });
    await withStartupLock(pool, () => migratePg(db, { migrationsFolder: migrationsFolder() }));
    return { db: db as unknown as Database, mode: 'server', close, exclusive: (work) => withStartupLock(pool, work) };
  } catch (error) {
    await close();
    throw error;
  }
}

/** Runs `work` holding the startup advisory lock of the database (migrations, demo seed). */
export async function withStartupLock<T>(pool: pg.Pool, work: () => Promise<T>): Promise<T> {
  const lock = await pool.connect();
  try {
    await lock.query('select pg_advisory_lock($1)', [STARTUP_LOCK_KEY]);
    return await work();
  } finally {
    await lock.query('select pg_advisory_unlock($1)', [STARTUP_LOCK_KEY]).catch(() => undefined);
    lock.release();
  }
}
