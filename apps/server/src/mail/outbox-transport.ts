/** A nodemailer transport that keeps each message in the outbox table instead of sending it. */
import type { MailKind } from '@hexloom/contracts';
import type { SendMailOptions, Transport } from 'nodemailer';
import type MailMessage from 'nodemailer/lib/mailer/mail-message.js';
import type { Database } from '../db/database.js';
import { outboxMessages } from '../db/schema/index.js';

/** Header naming the team a message belongs to (read by the outbox transport, not sent). */
export const TEAM_HEADER = 'x-hexloom-team';
/** Header naming the kind of message. */
export const KIND_HEADER = 'x-hexloom-kind';

type SentInfo = { envelope: { from: string; to: string[] }; messageId: string };

const headerOf = (data: SendMailOptions, name: string): string | null => {
  const headers = (data.headers ?? {}) as Record<string, unknown>;
  const value = headers[name];
  return typeof value === 'string' ? value : null;
};

/** The local fake transport: one outbox row per recipient. */
export class OutboxTransport implements Transport<SentInfo> {
  readonly name = 'hexloom-outbox';
  readonly version = '1';

  constructor(private readonly db: Database) {}

  send(mail: MailMessage<SentInfo>, callback: (err: Error | null, info: SentInfo) => void): void {
    const data = mail.data;
    const to = mail.message.getEnvelope().to.filter((a): a is string => typeof a === 'string' && a !== '');
    const rows = to.map((address) => ({
      teamId: headerOf(data, TEAM_HEADER),
      kind: (headerOf(data, KIND_HEADER) ?? 'mention') as MailKind,
      to: address,
      subject: String(data.subject ?? ''),
      text: String(data.text ?? ''),
    }));
    const info: SentInfo = { envelope: { from: String(data.from ?? ''), to }, messageId: `<outbox-${Date.now()}@hexloom.local>` };
    this.db
      .insert(outboxMessages)
      .values(rows)
      .then(() => callback(null, info))
      .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error)), info));
  }
}
