/** The invitations table: an e-mail address invited into a team with a role. */
import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { TeamRole } from '@hexloom/contracts';
import { teams } from './teams.js';
import { users } from './users.js';

/** Pending invitations have `accepted_at` null; e-mails are stored lower-case. */
export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role').$type<TeamRole>().notNull(),
    invitedBy: uuid('invited_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    /** SHA-256 of the token of the invitation link (the token itself is only in the mail). */
    tokenHash: text('token_hash').unique(),
  },
  (t) => [
    index('invitations_email_idx').on(t.email),
    check('invitations_role_check', sql`${t.role} in ('owner', 'designer', 'reviewer', 'viewer')`),
  ],
);

export type InvitationRow = typeof invitations.$inferSelect;
