/** The audit_events table: who did what to whom, and when. */
import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams.js';
import { users } from './users.js';

/** Append-only log; `team_id` is null for events outside a team (sign-in, sign-out). */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    target: text('target'),
    detail: jsonb('detail').$type<Record<string, unknown>>().notNull().default({}),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_events_team_at_idx').on(t.teamId, t.at)],
);

export type AuditEventRow = typeof auditEvents.$inferSelect;
