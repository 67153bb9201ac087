/** The users table: one row per person signed in through the identity provider. */
import { pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';

/** People; `provider_id` is unique per `provider` (the fake provider's ids are prefixed `local:`). */
export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    provider: text('provider').notNull(),
    providerId: text('provider_id').notNull(),
    login: text('login').notNull(),
    name: text('name').notNull(),
    email: text('email'),
    avatarUrl: text('avatar_url'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_provider_provider_id_key').on(t.provider, t.providerId)],
);

export type UserRow = typeof users.$inferSelect;
