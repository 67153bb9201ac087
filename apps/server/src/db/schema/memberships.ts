/** The memberships table: who belongs to which team, with which role. */
import { sql } from 'drizzle-orm';
import { check, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { TeamRole } from '@hexloom/contracts';
import { teams } from './teams.js';
import { users } from './users.js';

/** One row per (team, user); the role is one of the four team roles. */
export const memberships = pgTable(
  'memberships',
  {
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text('role').$type<TeamRole>().notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.teamId, t.userId] }),
    check('memberships_role_check', sql`${t.role} in ('owner', 'designer', 'reviewer', 'viewer')`),
  ],
);

export type MembershipRow = typeof memberships.$inferSelect;
