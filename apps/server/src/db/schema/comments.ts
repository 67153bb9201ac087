/** The comments table: threaded comments on a version, optionally anchored to a gate or a frequency range. */
import type { CommentAnchor } from '@hexloom/contracts';
import { type AnyPgColumn, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { configurationVersions } from './configuration-versions.js';
import { users } from './users.js';

/** `parent_id` threads a reply under another comment of the same version; `resolved_at`/`resolved_by` mark a thread resolved. */
export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => configurationVersions.id, { onDelete: 'cascade' }),
    parentId: uuid('parent_id').references((): AnyPgColumn => comments.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id')
      .notNull()
      .references(() => users.id),
    body: text('body').notNull(),
    anchor: jsonb('anchor').$type<CommentAnchor>(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    resolvedBy: uuid('resolved_by').references(() => users.id),
  },
  (t) => [index('comments_version_idx').on(t.versionId, t.createdAt)],
);

export type CommentRow = typeof comments.$inferSelect;
