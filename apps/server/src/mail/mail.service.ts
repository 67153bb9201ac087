/** Sends Hexloom's e-mail: SMTP when SMTP_URL is set, else the outbox table (the local fake transport). */
import { Inject, Injectable, Logger } from '@nestjs/common';
import type { MailKind, OutboxMessage } from '@hexloom/contracts';
import { desc, eq } from 'drizzle-orm';
import nodemailer, { type Transporter } from 'nodemailer';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { DATABASE, type Database } from '../db/database.js';
import { outboxMessages } from '../db/schema/index.js';
import { KIND_HEADER, OutboxTransport, TEAM_HEADER } from './outbox-transport.js';

/** One message to send. */
export type Mail = { teamId: string | null; kind: MailKind; to: readonly string[]; subject: string; text: string };

/** Mail is sent after the change it reports has committed; a failing SMTP server is logged, not fatal. */
@Injectable()
export class MailService {
  private readonly logger = new Logger('MailService');
  private readonly transporter: Transporter;

  constructor(
    @Inject(DATABASE) private readonly db: Database,
    @Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions,
  ) {
    this.transporter = options.smtpUrl ? nodemailer.createTransport(options.smtpUrl) : nodemailer.createTransport(new OutboxTransport(db));
  }

  /** True when messages go to the outbox table. */
  get usesOutbox(): boolean {
    return this.options.smtpUrl === null;
  }

  /** Sends `mail` to every address in `to` (nothing when the list is empty). */
  async send(mail: Mail): Promise<void> {
    const to = [...new Set(mail.to.filter((a) => a.length > 0))];
    if (to.length === 0) return;
    try {
      await this.transporter.sendMail({
        from: this.options.mailFrom,
        to,
        subject: mail.subject,
        text: mail.text,
        headers: { [TEAM_HEADER]: mail.teamId ?? '', [KIND_HEADER]: mail.kind },
      });
    } catch (error) {
      this.logger.error(`mail "${mail.subject}" to ${to.join(', ')} failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** The outbox of a team, newest first. */
  async outbox(teamId: string, limit = 200): Promise<OutboxMessage[]> {
    const rows = await this.db.select().from(outboxMessages).where(eq(outboxMessages.teamId, teamId)).orderBy(desc(outboxMessages.createdAt)).limit(limit);
    return rows.map((r) => ({ id: r.id, kind: r.kind, to: r.to, subject: r.subject, text: r.text, createdAt: r.createdAt.toISOString() }));
  }
}
