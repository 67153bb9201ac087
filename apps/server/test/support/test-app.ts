// Test helper: an in-memory Hexloom app with the demo seed, plus direct database access for assertions.
import type { INestApplication } from '@nestjs/common';
import { count, eq } from 'drizzle-orm';
import { createHexloomApp, type CreateHexloomAppOptions } from '../../src/app.factory.js';
import { DATABASE, type Database } from '../../src/db/database.js';
import { auditEvents, teams, users } from '../../src/db/schema/index.js';

/** Starts an in-memory app with the demo team and accounts (not the demo designs unless asked); options override. */
export async function startTestApp(options: Partial<CreateHexloomAppOptions> = {}): Promise<INestApplication> {
  return createHexloomApp({ dataDir: 'memory', seedDemo: true, seedDemoDesigns: false, sessionSecret: 'test-secret', ...options });
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
