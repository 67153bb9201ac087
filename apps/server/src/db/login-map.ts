/** Looks up the logins of a set of user ids (answers name people by login). */
import { inArray } from 'drizzle-orm';
import type { DbExecutor } from './database.js';
import { users } from './schema/index.js';

/** Map from user id to login for every id given (unknown ids are left out). */
export async function loginMap(db: DbExecutor, ids: readonly (string | null)[]): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await db.select({ id: users.id, login: users.login }).from(users).where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r.login]));
}
