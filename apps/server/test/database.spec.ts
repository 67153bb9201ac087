// Migrations apply on a fresh database, the constraints hold, and the demo seed is idempotent.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { count, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type OpenDatabase } from '../src/db/migrate.js';
import { memberships, teams, users } from '../src/db/schema/index.js';
import { seedDemo } from '../src/db/seed.js';
import { databaseOf, startTestApp } from './support/test-app.js';

describe('a fresh in-memory database', () => {
  let sut: OpenDatabase;

  beforeAll(async () => {
    sut = await openDatabase('memory');
  });
  afterAll(async () => {
    await sut.close();
  });

  it('has every table after the migrations ran', async () => {
    const rows = (await sut.db.execute(sql`select table_name from information_schema.tables where table_schema = 'public' order by table_name`)) as unknown as { rows: { table_name: string }[] };
    expect(rows.rows.map((r) => r.table_name)).toEqual([
      'audit_events', 'calibrations', 'chips', 'comments', 'configuration_versions', 'configurations', 'invitations', 'measurements',
      'memberships', 'outbox_messages', 'reviews', 'sessions', 'simulation_cache', 'teams', 'users', 'yield_chunk_results', 'yield_jobs',
    ]);
  });

  it('rejects a membership role outside the four roles (check constraint)', async () => {
    const [team] = await sut.db.insert(teams).values({ slug: 'ck', name: 'Check' }).returning();
    const [user] = await sut.db.insert(users).values({ provider: 'github', providerId: '1', login: 'a', name: 'A' }).returning();
    await expect(
      sut.db.execute(sql`insert into memberships (team_id, user_id, role) values (${team?.id}, ${user?.id}, 'admin')`),
    ).rejects.toMatchObject({ cause: { message: expect.stringMatching(/violates check constraint "memberships_role_check"/) } });
  });

  it('rejects a second user with the same provider id', async () => {
    await sut.db.insert(users).values({ provider: 'github', providerId: 'dup', login: 'b', name: 'B' });
    await expect(sut.db.insert(users).values({ provider: 'github', providerId: 'dup', login: 'c', name: 'C' })).rejects.toMatchObject({
      cause: { message: expect.stringMatching(/duplicate key value violates unique constraint "users_provider_provider_id_key"/) },
    });
  });

  it('seeds the demo once: a second run creates nothing', async () => {
    const first = await seedDemo(sut.db);
    const second = await seedDemo(sut.db);
    expect(first).toMatchObject({ createdUsers: 8, createdMemberships: 8 });
    expect(second).toEqual({ teamId: first.teamId, createdUsers: 0, createdMemberships: 0 });
    const [m] = await sut.db.select({ n: count() }).from(memberships);
    expect(m?.n).toBe(8);
  });
});

describe('two starts on the same data directory', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'hexloom-db-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('keeps the data and does not duplicate the demo seed', async () => {
    const counts = async (): Promise<number[]> => {
      const app = await startTestApp({ dataDir });
      try {
        const db = databaseOf(app);
        const [u] = await db.select({ n: count() }).from(users);
        const [t] = await db.select({ n: count() }).from(teams);
        const [m] = await db.select({ n: count() }).from(memberships);
        return [u?.n ?? -1, t?.n ?? -1, m?.n ?? -1];
      } finally {
        await app.close();
      }
    };
    expect(await counts()).toEqual([8, 1, 8]);
    expect(await counts()).toEqual([8, 1, 8]);
  }, 120_000);
});
