/** The yield_chunk_results table: the runs of each finished chunk of a queued yield job (shared job queue mode). */
import type { MonteCarloRun } from '@hexloom/synth';
import { integer, jsonb, pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { yieldJobs } from './yield-jobs.js';

/** One row per finished chunk: a chunk run twice (a worker died before acknowledging it) is written once. */
export const yieldChunkResults = pgTable(
  'yield_chunk_results',
  {
    jobId: uuid('job_id')
      .notNull()
      .references(() => yieldJobs.id, { onDelete: 'cascade' }),
    chunkIndex: integer('chunk_index').notNull(),
    runs: jsonb('runs').$type<MonteCarloRun[]>().notNull(),
    finishedAt: timestamp('finished_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.jobId, t.chunkIndex] })],
);
