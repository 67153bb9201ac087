/** Invitations: create (mailing a link with a secret token), list, revoke, and accept on sign-in through that link. */
import { createHash, randomBytes } from 'node:crypto';
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { CreateInvitation, Invitation, User } from '@hexloom/contracts';
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { AuditService } from '../audit/audit.service.js';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { invitations, memberships, teams, users } from '../db/schema/index.js';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { MailService } from '../mail/mail.service.js';

/** Only the SHA-256 of an invitation link's token is stored. */
const hashToken = (token: string): string => createHash('sha256').update(token).digest('hex');
import { AlreadyMemberError, InvitationAcceptedError, InvitationPendingError } from './invitation-errors.js';

const inviter = alias(users, 'inviter');

const invitationColumns = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  invitedBy: inviter.login,
  createdAt: invitations.createdAt,
  acceptedAt: invitations.acceptedAt,
};

type InvitationRow = Omit<Invitation, 'createdAt' | 'acceptedAt'> & { createdAt: Date; acceptedAt: Date | null };

const toInvitation = (row: InvitationRow): Invitation => ({
  ...row,
  createdAt: row.createdAt.toISOString(),
  acceptedAt: row.acceptedAt?.toISOString() ?? null,
});

/** Invitation operations; the caller's role was checked by TeamRolesGuard. */
@Injectable()
export class InvitationsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions,
  ) {}

  /** Every invitation of the team (pending and accepted), newest first; `invitedBy` is a login. */
  async list(teamId: string): Promise<Invitation[]> {
    const rows = await this.db
      .select(invitationColumns)
      .from(invitations)
      .innerJoin(inviter, eq(inviter.id, invitations.invitedBy))
      .where(eq(invitations.teamId, teamId))
      .orderBy(desc(invitations.createdAt));
    return rows.map(toInvitation);
  }

  /** Invites `body.email` and mails it; 409 if it is a member's e-mail or already pending. */
  async create(actor: User, teamId: string, body: CreateInvitation): Promise<Invitation> {
    const token = randomBytes(24).toString('base64url');
    const invitation = await this.db.transaction(async (tx) => {
      const [member] = await tx
        .select({ userId: users.id })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.teamId, teamId), eq(sql`lower(${users.email})`, body.email)));
      if (member) throw new AlreadyMemberError(body.email);
      const [pending] = await tx
        .select({ id: invitations.id })
        .from(invitations)
        .where(and(eq(invitations.teamId, teamId), eq(invitations.email, body.email), isNull(invitations.acceptedAt)));
      if (pending) throw new InvitationPendingError(body.email);
      const [row] = await tx
        .insert(invitations)
        .values({ teamId, email: body.email, role: body.role, invitedBy: actor.id, tokenHash: hashToken(token) })
        .returning();
      if (!row) throw new Error(`InvitationsService.create: insert of "${body.email}" returned no row`);
      await this.audit.record(
        { action: 'invitation.created', teamId, actorId: actor.id, target: body.email, detail: { invitationId: row.id, role: body.role } },
        tx,
      );
      return toInvitation({ ...row, invitedBy: actor.login });
    });
    const [team] = await this.db.select({ name: teams.name }).from(teams).where(eq(teams.id, teamId));
    await this.mail.send({
      teamId,
      kind: 'invitation',
      to: [body.email],
      subject: `${actor.name} invited you to ${team?.name ?? 'a team'} on Hexloom`,
      text: `${actor.name} (${actor.login}) invited you to join ${team?.name ?? 'their team'} as ${body.role}.\nOpen this link and sign in to accept: ${this.options.publicUrl}/api/auth/login?invitation=${token}\nThe link is yours alone; do not forward it.`,
    });
    return invitation;
  }

  /** Deletes a pending invitation; 404 if unknown in this team, 409 if already accepted. */
  async revoke(actor: User, teamId: string, invitationId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const [row] = await tx
        .select()
        .from(invitations)
        .where(and(eq(invitations.teamId, teamId), eq(invitations.id, invitationId)));
      if (!row) throw new NotFoundException(`Invitation "${invitationId}" not found in team "${teamId}"`);
      if (row.acceptedAt) throw new InvitationAcceptedError(invitationId);
      await tx.delete(invitations).where(eq(invitations.id, invitationId));
      await this.audit.record(
        { action: 'invitation.revoked', teamId, actorId: actor.id, target: row.email, detail: { invitationId, role: row.role } },
        tx,
      );
    });
  }

  /** Accepts the pending invitation whose link token is `token` for `user` (any e-mail); 0 when none matches. */
  async acceptByToken(user: User, token: string, tx: DbExecutor): Promise<number> {
    const [invitation] = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt)));
    if (!invitation) return 0;
    await this.accept(user, invitation, tx);
    return 1;
  }

  private async accept(user: User, invitation: typeof invitations.$inferSelect, tx: DbExecutor): Promise<void> {
    await tx.insert(memberships).values({ teamId: invitation.teamId, userId: user.id, role: invitation.role }).onConflictDoNothing();
    await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, invitation.id));
    await this.audit.record(
      { action: 'invitation.accepted', teamId: invitation.teamId, actorId: user.id, target: invitation.email, detail: { invitationId: invitation.id, role: invitation.role } },
      tx,
    );
  }

  /**
   * Accepts every pending invitation for `user.email`: adds the memberships (an existing
   * membership keeps its role) and stamps `accepted_at`. Returns the number accepted.
   */
  async acceptPendingFor(user: User, tx: DbExecutor): Promise<number> {
    if (!user.email) return 0;
    const email = user.email.toLowerCase();
    const pending = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.email, email), isNull(invitations.acceptedAt)));
    for (const invitation of pending) await this.accept(user, invitation, tx);
    return pending.length;
  }
}
