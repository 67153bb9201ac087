/** The chips table: a team's chip definitions (the chip JSON), edited in place with a revision count. */
import type { MeshDefinitionFile } from '@hexloom/contracts';
import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams.js';
import { users } from './users.js';

/** One chip of a team; `definition` is the mesh definition file (schema version 1). */
export const chips = pgTable(
  'chips',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    definition: jsonb('definition').$type<MeshDefinitionFile>().notNull(),
    revision: integer('revision').notNull().default(1),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('chips_team_idx').on(t.teamId)],
);

export type ChipRow = typeof chips.$inferSelect;
