/** Sessions: random 32-byte tokens in the cookie, their sha-256 digests in the database. */
import { createHash, randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { User } from '@hexloom/contracts';
import { and, eq, gt } from 'drizzle-orm';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { sessions, users } from '../db/schema/index.js';
import { SESSION_LIFETIME_MS } from './session-cookie.js';

/** A resolved session: its id (the digest) and its user. */
export type ActiveSession = { sessionId: string; user: User };

/** `last_seen_at` is refreshed at most once a minute per session. */
const LAST_SEEN_RESOLUTION_MS = 60_000;

/** sha-256 hex digest of a raw token (what the sessions table stores as id). */
export function hashSessionToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Creates, resolves and deletes sessions. */
@Injectable()
export class SessionsService {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Creates a 30-day session for `userId`; returns the raw token for the cookie. */
  async create(userId: string, executor: DbExecutor = this.db): Promise<{ token: string; sessionId: string }> {
    const token = randomBytes(32).toString('base64url');
    const sessionId = hashSessionToken(token);
    await executor.insert(sessions).values({ id: sessionId, userId, expiresAt: new Date(Date.now() + SESSION_LIFETIME_MS) });
    return { token, sessionId };
  }

  /** The unexpired session behind a raw token, or null. */
  async resolve(token: string): Promise<ActiveSession | null> {
    const sessionId = hashSessionToken(token);
    const now = new Date();
    const [row] = await this.db
      .select({
        lastSeenAt: sessions.lastSeenAt,
        id: users.id,
        login: users.login,
        name: users.name,
        email: users.email,
        avatarUrl: users.avatarUrl,
      })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(and(eq(sessions.id, sessionId), gt(sessions.expiresAt, now)));
    if (!row) return null;
    const { lastSeenAt, ...user } = row;
    if (now.getTime() - lastSeenAt.getTime() > LAST_SEEN_RESOLUTION_MS) {
      await this.db.update(sessions).set({ lastSeenAt: now }).where(eq(sessions.id, sessionId));
    }
    return { sessionId, user };
  }

  /** Deletes the session behind a raw token; returns its user id, or null if there was none. */
  async delete(token: string): Promise<string | null> {
    const [row] = await this.db
      .delete(sessions)
      .where(eq(sessions.id, hashSessionToken(token)))
      .returning({ userId: sessions.userId });
    return row?.userId ?? null;
  }
}
