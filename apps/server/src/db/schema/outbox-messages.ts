/** The outbox_messages table: e-mail kept by the local fake transport when no SMTP server is set. */
import type { MailKind } from '@hexloom/contracts';
import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams.js';

/** One message as it would have been sent. */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    kind: text('kind').$type<MailKind>().notNull(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('outbox_messages_team_idx').on(t.teamId, t.createdAt)],
);

export type OutboxMessageRow = typeof outboxMessages.$inferSelect;
