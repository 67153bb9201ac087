/** Writes and reads the audit log. */
import { Inject, Injectable } from '@nestjs/common';
import type { AuditEvent } from '@hexloom/contracts';
import { desc, eq, sql } from 'drizzle-orm';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { auditEvents, users } from '../db/schema/index.js';

/** The audited actions. */
export type AuditAction =
  | 'auth.signed_in'
  | 'auth.signed_out'
  | 'team.created'
  | 'member.role_changed'
  | 'member.removed'
  | 'invitation.created'
  | 'invitation.revoked'
  | 'invitation.accepted'
  | 'chip.created'
  | 'chip.updated'
  | 'calibration.uploaded'
  | 'configuration.created'
  | 'configuration.duplicated'
  | 'version.saved'
  | 'review.requested'
  | 'review.decided'
  | 'comment.created'
  | 'comment.resolved'
  | 'comment.reopened'
  | 'measurement.uploaded'
  | 'yield_job.started'
  | 'yield_job.cancelled';

/** One event to record; `target` is a human-readable name (login, e-mail, slug). */
export type AuditEntry = {
  action: AuditAction;
  teamId: string | null;
  actorId: string | null;
  target: string | null;
  detail?: Record<string, unknown>;
};

/** Append-only audit log; pass the caller's transaction so the event commits with the change. */
@Injectable()
export class AuditService {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Records one event inside `executor` (defaults to the database itself). */
  async record(entry: AuditEntry, executor: DbExecutor = this.db): Promise<void> {
    await executor.insert(auditEvents).values({
      action: entry.action,
      teamId: entry.teamId,
      actorId: entry.actorId,
      target: entry.target,
      detail: entry.detail ?? {},
      // clock_timestamp, not now(): events of one transaction must still order by time.
      at: sql`clock_timestamp()`,
    });
  }

  /** The newest `limit` events of a team, newest first, actors given by login. */
  async listForTeam(teamId: string, limit: number): Promise<AuditEvent[]> {
    const rows = await this.db
      .select({
        id: auditEvents.id,
        at: auditEvents.at,
        actor: users.login,
        action: auditEvents.action,
        target: auditEvents.target,
        detail: auditEvents.detail,
      })
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(eq(auditEvents.teamId, teamId))
      .orderBy(desc(auditEvents.at), desc(auditEvents.id))
      .limit(limit);
    return rows.map((row) => ({ ...row, at: row.at.toISOString() }));
  }
}
