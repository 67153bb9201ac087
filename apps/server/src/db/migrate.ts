/** Opens PGlite (file-backed or in-memory) and applies the generated SQL migrations. */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { findRepoRoot } from '../common/find-repo-root.js';
import { lockDataDir } from './data-dir-lock.js';
import type { Database } from './database.js';
import * as schema from './schema/index.js';

/** An open database: the Drizzle handle, the PGlite client, and `close` (closes it and frees the data folder). */
export type OpenDatabase = { db: Database; client: PGlite; close: () => Promise<void> };

/** The folder drizzle-kit generates migrations into (top-level `drizzle/`). */
export function migrationsFolder(): string {
  return join(findRepoRoot(), 'drizzle');
}

/**
 * Opens the database in `dataDir` (created if missing) or in memory for `'memory'`,
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
    const db = drizzle({ client, schema });
    await migrate(db, { migrationsFolder: migrationsFolder() });
    return { db, client, close };
  } catch (error) {
    await close();
    throw error;
  }
}
