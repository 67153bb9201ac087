// Test helper: an in-memory Hexloom app with the demo seed, plus direct database access for assertions.
import { randomUUID } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import pg from 'pg';
import { count, eq } from 'drizzle-orm';
import { createHexloomApp, type CreateHexloomAppOptions } from '../../src/app.factory.js';
import { DATABASE, type Database } from '../../src/db/database.js';
import { auditEvents, teams, users } from '../../src/db/schema/index.js';

/**
 * A fresh database on the PostgreSQL server of `HEXLOOM_TEST_DATABASE_URL` (the suite's second run, see scripts/test.sh),
 * or undefined when the suite runs on embedded PGlite.
 */
export async function freshServerDatabase(): Promise<string | undefined> {
  const admin = process.env['HEXLOOM_TEST_DATABASE_URL'];
  if (!admin) return undefined;
  const name = `hexloom_t_${randomUUID().replace(/-/g, '')}`;
  const client = new pg.Client({ connectionString: admin });
  await client.connect();
  try {
    await client.query(`create database ${name}`);
  } finally {
    await client.end();
  }
  const url = new URL(admin);
  url.pathname = `/${name}`;
  return url.toString();
}

/**
 * Starts an app with the demo team and accounts (not the demo designs unless asked); options override. In memory on
 * PGlite, or on a fresh PostgreSQL database when the suite runs against a server (unless a data folder is given).
 */
export async function startTestApp(options: Partial<CreateHexloomAppOptions> = {}): Promise<INestApplication> {
  const databaseUrl = options.dataDir === undefined && options.databaseUrl === undefined ? await freshServerDatabase() : undefined;
  return createHexloomApp({ dataDir: 'memory', seedDemo: true, seedDemoDesigns: false, sessionSecret: 'test-secret', ...(databaseUrl ? { databaseUrl } : {}), ...options });
}

/** The Drizzle handle of a running app. */
export function databaseOf(app: INestApplication): Database {
  return app.get<Database>(DATABASE, { strict: false });
}

/** Number of audit events recorded so far. */
export async function auditCount(app: INestApplication): Promise<number> {
  const [row] = await databaseOf(app).select({ n: count() }).from(auditEvents);
  return row?.n ?? 0;
}

/** Id of the seeded demo team. */
export async function demoTeamId(app: INestApplication): Promise<string> {
  const [row] = await databaseOf(app).select({ id: teams.id }).from(teams).where(eq(teams.slug, 'kestrel-vale'));
  if (!row) throw new Error('demoTeamId: the demo team is not seeded');
  return row.id;
}

/** Id of the user with `login`. */
export async function userIdOf(app: INestApplication, login: string): Promise<string> {
  const [row] = await databaseOf(app).select({ id: users.id }).from(users).where(eq(users.login, login));
  if (!row) throw new Error(`userIdOf: no user "${login}"`);
  return row.id;
}
