/** The reviews table: a named reviewer asked to review one version, and their decision. */
import { sql } from 'drizzle-orm';
import { check, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { configurationVersions } from './configuration-versions.js';
import { users } from './users.js';

/** One (version, reviewer) pair; `decision` is null until they decide. */
export const reviews = pgTable(
  'reviews',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => configurationVersions.id, { onDelete: 'cascade' }),
    reviewerId: uuid('reviewer_id')
      .notNull()
      .references(() => users.id),
    requestedBy: uuid('requested_by')
      .notNull()
      .references(() => users.id),
    requestedAt: timestamp('requested_at', { withTimezone: true }).notNull().defaultNow(),
    decision: text('decision').$type<'approve' | 'request_changes'>(),
    note: text('note').notNull().default(''),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
  },
  (t) => [
    unique('reviews_version_reviewer_key').on(t.versionId, t.reviewerId),
    check('reviews_decision_check', sql`${t.decision} is null or ${t.decision} in ('approve', 'request_changes')`),
  ],
);

export type ReviewRow = typeof reviews.$inferSelect;
