/** Threaded comments on a version, optionally anchored to a gate or a frequency range; @mentions are mailed; threads resolve. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Comment, CreateComment, UpdateComment, User } from '@hexloom/contracts';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { buildChipMesh } from '../chips/chips.service.js';
import { ConfigurationsService } from '../configurations/configurations.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { comments, type CommentRow, memberships, users } from '../db/schema/index.js';
import { MailService } from '../mail/mail.service.js';
import { mentionedLogins } from './mentions.js';
import { InvalidCommentError } from './review-errors.js';

/** Comment operations. */
@Injectable()
export class CommentsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly configurations: ConfigurationsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  /** Comments of a version, oldest first (replies carry their parent's id). */
  async list(teamId: string, configurationId: string, number: number): Promise<Comment[]> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const rows = await this.db.select().from(comments).where(eq(comments.versionId, ref.version.id)).orderBy(asc(comments.createdAt));
    return this.toComments(teamId, rows, number);
  }

  /** Adds a comment; 422 when the parent is not a comment of this version or the anchored gate is not on the chip. */
  async create(actor: User, teamId: string, configurationId: string, number: number, body: CreateComment): Promise<Comment> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    if (body.parentId) {
      const [parent] = await this.db.select({ id: comments.id }).from(comments).where(and(eq(comments.id, body.parentId), eq(comments.versionId, ref.version.id)));
      if (!parent) throw new InvalidCommentError('parentId', `"${body.parentId}" is not a comment of version ${number}`);
    }
    if (body.anchor && 'gate' in body.anchor && !buildChipMesh(ref.version.content.mesh).gateIndex.has(body.anchor.gate)) {
      throw new InvalidCommentError('anchor.gate', `${body.anchor.gate} is not a gate of this chip`);
    }
    const row = await this.db.transaction(async (tx) => {
      const [inserted] = await tx
        .insert(comments)
        .values({ versionId: ref.version.id, parentId: body.parentId ?? null, authorId: actor.id, body: body.body, anchor: body.anchor ?? null })
        .returning();
      if (!inserted) throw new Error('CommentsService.create: insert returned no row');
      await this.audit.record(
        { action: 'comment.created', teamId, actorId: actor.id, target: `${ref.configuration.name} v${number}`, detail: { configurationId, version: number, commentId: inserted.id } },
        tx,
      );
      return inserted;
    });
    const mentioned = (await this.memberLogins(teamId, mentionedLogins(body.body))).filter((l) => l !== actor.login);
    if (mentioned.length > 0) {
      const people = await this.db.select({ email: users.email }).from(users).where(inArray(users.login, mentioned));
      await this.mail.send({
        teamId,
        kind: 'mention',
        to: people.map((p) => p.email ?? ''),
        subject: `${actor.login} mentioned you on ${ref.configuration.name} version ${number}`,
        text: `${actor.name} (${actor.login}) wrote on version ${number} of "${ref.configuration.name}":\n\n${body.body}`,
      });
    }
    return (await this.toComments(teamId, [row], number))[0] as Comment;
  }

  /** Resolves or reopens the thread `commentId` starts; 404 when it is not a comment of this version, 422 for a reply. */
  async update(actor: User, teamId: string, configurationId: string, number: number, commentId: string, body: UpdateComment): Promise<Comment> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const [found] = await this.db.select().from(comments).where(and(eq(comments.id, commentId), eq(comments.versionId, ref.version.id)));
    if (!found) throw new NotFoundException(`Comment "${commentId}" not found on version ${number}`);
    if (found.parentId !== null) throw new InvalidCommentError('commentId', 'a reply is resolved with its thread; resolve the first comment of the thread');
    const row = await this.db.transaction(async (tx) => {
      const [updated] = await tx
        .update(comments)
        .set(body.resolved ? { resolvedAt: sql`now()`, resolvedBy: actor.id } : { resolvedAt: null, resolvedBy: null })
        .where(eq(comments.id, found.id))
        .returning();
      if (!updated) throw new Error('CommentsService.update: update returned no row');
      await this.audit.record(
        {
          action: body.resolved ? 'comment.resolved' : 'comment.reopened',
          teamId,
          actorId: actor.id,
          target: `${ref.configuration.name} v${number}`,
          detail: { configurationId, version: number, commentId: found.id },
        },
        tx,
      );
      return updated;
    });
    return (await this.toComments(teamId, [row], number))[0] as Comment;
  }

  /** The logins among `candidates` that belong to members of the team, in the order given. */
  private async memberLogins(teamId: string, candidates: readonly string[]): Promise<string[]> {
    if (candidates.length === 0) return [];
    const rows = await this.db
      .select({ login: users.login })
      .from(users)
      .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, teamId)))
      .where(inArray(users.login, [...candidates]));
    const members = new Set(rows.map((r) => r.login));
    return candidates.filter((l) => members.has(l));
  }

  /** Answers for `rows`; mentions are the `@login`s of the body that name a member of the team. */
  private async toComments(teamId: string, rows: CommentRow[], versionNumber: number): Promise<Comment[]> {
    const logins = await loginMap(this.db, rows.flatMap((r) => [r.authorId, r.resolvedBy]));
    const members = new Set(await this.memberLogins(teamId, [...new Set(rows.flatMap((r) => mentionedLogins(r.body)))]));
    return rows.map((r) => ({
      id: r.id,
      versionNumber,
      parentId: r.parentId,
      author: logins.get(r.authorId) ?? '',
      body: r.body,
      anchor: r.anchor ?? null,
      mentions: mentionedLogins(r.body).filter((l) => members.has(l)),
      createdAt: r.createdAt.toISOString(),
      resolvedAt: r.resolvedAt?.toISOString() ?? null,
      resolvedBy: r.resolvedBy ? (logins.get(r.resolvedBy) ?? null) : null,
    }));
  }
}
