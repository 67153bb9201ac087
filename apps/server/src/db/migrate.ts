/** Opens PGlite (file-backed or in-memory) and applies the generated SQL migrations. */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { findRepoRoot } from '../common/find-repo-root.js';
import type { Database } from './database.js';
import * as schema from './schema/index.js';

/** An open database: the Drizzle handle and the PGlite client to close. */
export type OpenDatabase = { db: Database; client: PGlite };

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
  if (dataDir === 'memory') {
    client = new PGlite();
  } else {
    mkdirSync(dataDir, { recursive: true });
    client = new PGlite(join(dataDir, 'pgdata'));
  }
  const db = drizzle({ client, schema });
  await migrate(db, { migrationsFolder: migrationsFolder() });
  return { db, client };
}
