/** The yield_jobs table: Monte Carlo yield studies run in worker threads, with progress and result. */
import type { StartYieldJob, YieldJob, YieldJobStatus } from '@hexloom/contracts';
import { sql } from 'drizzle-orm';
import { check, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { configurationVersions } from './configuration-versions.js';
import { users } from './users.js';

/** One study of one version; progress is written as chunks finish. */
export const yieldJobs = pgTable(
  'yield_jobs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => configurationVersions.id, { onDelete: 'cascade' }),
    request: jsonb('request').$type<StartYieldJob>().notNull(),
    status: text('status').$type<YieldJobStatus>().notNull().default('running'),
    runsDone: integer('runs_done').notNull().default(0),
    runsTotal: integer('runs_total').notNull(),
    /** Chunks the job was split into (the shared queue finishes a job when every chunk has its result). */
    chunkCount: integer('chunk_count').notNull().default(0),
    summary: jsonb('summary').$type<YieldJob['summary']>(),
    error: text('error'),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    /** Last sign of life of the server running the job (set as chunks finish). */
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check('yield_jobs_status_check', sql`${t.status} in ('running', 'done', 'cancelled', 'failed', 'interrupted')`)],
);

export type YieldJobRow = typeof yieldJobs.$inferSelect;
