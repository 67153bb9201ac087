/** The configurations table: a named configuration of a chip and the number of its newest version. */
import { index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { chips } from './chips.js';
import { teams } from './teams.js';
import { users } from './users.js';

/** `head_version` is the compare-and-set guard of optimistic concurrency. */
export const configurations = pgTable(
  'configurations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    chipId: uuid('chip_id')
      .notNull()
      .references(() => chips.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    headVersion: integer('head_version').notNull().default(1),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('configurations_chip_idx').on(t.chipId)],
);

export type ConfigurationRow = typeof configurations.$inferSelect;
