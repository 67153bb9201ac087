/** Reviews of a version: request named reviewers, decide (approve / request changes), list. */
import { Inject, Injectable } from '@nestjs/common';
import type { RequestReview, Review, ReviewDecision, User } from '@hexloom/contracts';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { ConfigurationsService } from '../configurations/configurations.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { configurationVersions, memberships, reviews, type ReviewRow, users } from '../db/schema/index.js';
import { MailService } from '../mail/mail.service.js';
import { InvalidReviewerError, NotAReviewerError } from './review-errors.js';

/** Review operations; approval is tied to the exact version (a later save starts as a draft). */
@Injectable()
export class ReviewsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly configurations: ConfigurationsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  /** Reviews of one version, oldest request first. */
  async list(teamId: string, configurationId: string, number: number): Promise<Review[]> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const rows = await this.db.select().from(reviews).where(eq(reviews.versionId, ref.version.id)).orderBy(asc(reviews.requestedAt));
    return this.toReviews(rows, number);
  }

  /**
   * Names reviewers (members who are owners, designers or reviewers, never the version's author), sets the
   * version in review and mails each reviewer. Asking someone again clears their earlier decision.
   */
  async request(actor: User, teamId: string, configurationId: string, number: number, body: RequestReview): Promise<Review[]> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const logins = [...new Set(body.reviewers)];
    const found = await this.db
      .select({ id: users.id, login: users.login, email: users.email, role: memberships.role })
      .from(users)
      .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, teamId)))
      .where(inArray(users.login, logins));
    for (const login of logins) {
      const person = found.find((f) => f.login === login);
      if (!person) throw new InvalidReviewerError(login, 'not a member of this team');
      if (person.role === 'viewer') throw new InvalidReviewerError(login, 'viewers cannot review');
      if (person.id === ref.version.authorId) throw new InvalidReviewerError(login, 'the author cannot review their own version');
    }
    await this.db.transaction(async (tx) => {
      for (const person of found) {
        await tx
          .insert(reviews)
          .values({ versionId: ref.version.id, reviewerId: person.id, requestedBy: actor.id })
          .onConflictDoUpdate({ target: [reviews.versionId, reviews.reviewerId], set: { decision: null, decidedAt: null, note: '', requestedBy: actor.id, requestedAt: sql`now()` } });
      }
      await tx.update(configurationVersions).set({ status: 'in_review', approvedBy: null, approvedAt: null }).where(eq(configurationVersions.id, ref.version.id));
      await this.audit.record(
        { action: 'review.requested', teamId, actorId: actor.id, target: `${ref.configuration.name} v${number}`, detail: { configurationId, version: number, reviewers: logins } },
        tx,
      );
    });
    await this.mail.send({
      teamId,
      kind: 'review_requested',
      to: found.map((f) => f.email ?? ''),
      subject: `Review requested: ${ref.configuration.name} version ${number}`,
      text: `${actor.name} (${actor.login}) asks you to review version ${number} of "${ref.configuration.name}" on chip "${ref.chip.name}".${body.message ? `\n\n${body.message}` : ''}`,
    });
    return this.list(teamId, configurationId, number);
  }

  /** A named reviewer approves or requests changes; the version's status follows and the author is mailed. */
  async decide(actor: User, teamId: string, configurationId: string, number: number, body: ReviewDecision): Promise<Review[]> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const [mine] = await this.db.select().from(reviews).where(and(eq(reviews.versionId, ref.version.id), eq(reviews.reviewerId, actor.id)));
    if (!mine || ref.version.authorId === actor.id) throw new NotAReviewerError(actor.login, number);
    const approved = body.decision === 'approve';
    await this.db.transaction(async (tx) => {
      await tx.update(reviews).set({ decision: body.decision, note: body.note, decidedAt: sql`now()` }).where(eq(reviews.id, mine.id));
      await tx
        .update(configurationVersions)
        .set(approved ? { status: 'approved', approvedBy: actor.id, approvedAt: sql`now()` } : { status: 'changes_requested', approvedBy: null, approvedAt: null })
        .where(eq(configurationVersions.id, ref.version.id));
      await this.audit.record(
        { action: 'review.decided', teamId, actorId: actor.id, target: `${ref.configuration.name} v${number}`, detail: { configurationId, version: number, decision: body.decision } },
        tx,
      );
    });
    const [author] = await this.db.select({ email: users.email }).from(users).where(eq(users.id, ref.version.authorId));
    await this.mail.send({
      teamId,
      kind: 'review_decided',
      to: [author?.email ?? ''],
      subject: `${approved ? 'Approved' : 'Changes requested'}: ${ref.configuration.name} version ${number}`,
      text: `${actor.name} (${actor.login}) ${approved ? 'approved' : 'requested changes to'} version ${number} of "${ref.configuration.name}".${body.note ? `\n\n${body.note}` : ''}`,
    });
    return this.list(teamId, configurationId, number);
  }

  private async toReviews(rows: ReviewRow[], versionNumber: number): Promise<Review[]> {
    const logins = await loginMap(this.db, rows.flatMap((r) => [r.reviewerId, r.requestedBy]));
    return rows.map((r) => ({
      id: r.id,
      versionNumber,
      reviewer: logins.get(r.reviewerId) ?? '',
      requestedBy: logins.get(r.requestedBy) ?? '',
      requestedAt: r.requestedAt.toISOString(),
      decision: r.decision ?? null,
      note: r.note,
      decidedAt: r.decidedAt?.toISOString() ?? null,
    }));
  }
}
