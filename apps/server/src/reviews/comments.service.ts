/** Threaded comments on a version, optionally anchored to a gate or a frequency range; @mentions are mailed. */
import { Inject, Injectable } from '@nestjs/common';
import type { Comment, CreateComment, User } from '@hexloom/contracts';
import { and, asc, eq, inArray } from 'drizzle-orm';
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
    return this.toComments(rows, number);
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
    const mentioned = mentionedLogins(body.body).filter((l) => l !== actor.login);
    if (mentioned.length > 0) {
      const people = await this.db
        .select({ email: users.email })
        .from(users)
        .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, teamId)))
        .where(inArray(users.login, mentioned));
      await this.mail.send({
        teamId,
        kind: 'mention',
        to: people.map((p) => p.email ?? ''),
        subject: `${actor.login} mentioned you on ${ref.configuration.name} version ${number}`,
        text: `${actor.name} (${actor.login}) wrote on version ${number} of "${ref.configuration.name}":\n\n${body.body}`,
      });
    }
    return (await this.toComments([row], number))[0] as Comment;
  }

  private async toComments(rows: CommentRow[], versionNumber: number): Promise<Comment[]> {
    const logins = await loginMap(this.db, rows.map((r) => r.authorId));
    return rows.map((r) => ({
      id: r.id,
      versionNumber,
      parentId: r.parentId,
      author: logins.get(r.authorId) ?? '',
      body: r.body,
      anchor: r.anchor ?? null,
      createdAt: r.createdAt.toISOString(),
    }));
  }
}
