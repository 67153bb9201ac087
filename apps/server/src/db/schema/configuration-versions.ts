/** The configuration_versions table: immutable saved contents; only the review status changes. */
import type { CircuitFigures, CircuitSpec, ConfigurationFile, VersionStatus } from '@hexloom/contracts';
import { sql } from 'drizzle-orm';
import { check, integer, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { configurations } from './configurations.js';
import { users } from './users.js';

/** Version `number` of a configuration; (configuration, number) is unique. */
export const configurationVersions = pgTable(
  'configuration_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    configurationId: uuid('configuration_id')
      .notNull()
      .references(() => configurations.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    content: jsonb('content').$type<ConfigurationFile>().notNull(),
    specs: jsonb('specs').$type<CircuitSpec[]>().notNull().default([]),
    figures: jsonb('figures').$type<CircuitFigures>().notNull().default({}),
    note: text('note').notNull().default(''),
    status: text('status').$type<VersionStatus>().notNull().default('draft'),
    authorId: uuid('author_id')
      .notNull()
      .references(() => users.id),
    approvedBy: uuid('approved_by').references(() => users.id),
    approvedAt: timestamp('approved_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique('configuration_versions_number_key').on(t.configurationId, t.number),
    check('configuration_versions_status_check', sql`${t.status} in ('draft', 'in_review', 'approved', 'changes_requested')`),
  ],
);

export type ConfigurationVersionRow = typeof configurationVersions.$inferSelect;
