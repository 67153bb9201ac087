/** The teams table. */
import { pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** Teams, addressed in URLs by their unique slug. */
export const teams = pgTable('teams', {
  id: uuid('id').primaryKey().defaultRandom(),
  slug: text('slug').notNull().unique(),
  name: text('name').notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export type TeamRow = typeof teams.$inferSelect;
