/** Writes a finished chunk of a queued yield job and finishes the job when every chunk has its result. */
import { summariseMonteCarlo, type MonteCarloRun } from '@hexloom/synth';
import { and, asc, count, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/database.js';
import { yieldChunkResults, yieldJobs } from '../db/schema/index.js';

/** Whether the job still wants chunks run (not cancelled, failed, interrupted or done). */
export async function jobWantsChunks(db: Database, jobId: string): Promise<boolean> {
  const [row] = await db.select({ status: yieldJobs.status }).from(yieldJobs).where(eq(yieldJobs.id, jobId));
  return row?.status === 'running';
}

/** Whether this chunk already has its result (a retried chunk whose first worker finished after all). */
export async function chunkDone(db: Database, jobId: string, chunkIndex: number): Promise<boolean> {
  const [row] = await db.select({ n: count() }).from(yieldChunkResults).where(and(eq(yieldChunkResults.jobId, jobId), eq(yieldChunkResults.chunkIndex, chunkIndex)));
  return (row?.n ?? 0) > 0;
}

/**
 * Stores the chunk's runs (once), updates the runs done and the heartbeat, and when every chunk is in, summarises all
 * runs in chunk order and marks the job done — in one transaction, so two workers finishing together finish it once.
 */
export async function recordChunk(db: Database, jobId: string, chunkIndex: number, runs: MonteCarloRun[]): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.insert(yieldChunkResults).values({ jobId, chunkIndex, runs }).onConflictDoNothing();
    // Lock the job row: the last two chunks of a job may finish at the same moment.
    const [job] = await tx.select().from(yieldJobs).where(eq(yieldJobs.id, jobId)).for('update');
    if (!job || job.status !== 'running') return;
    const done = await tx.select({ runs: yieldChunkResults.runs }).from(yieldChunkResults).where(eq(yieldChunkResults.jobId, jobId)).orderBy(asc(yieldChunkResults.chunkIndex));
    const all = done.flatMap((d) => d.runs);
    if (done.length >= job.chunkCount) {
      await tx.update(yieldJobs).set({ status: 'done', runsDone: all.length, summary: summariseMonteCarlo(all), heartbeatAt: sql`now()` }).where(eq(yieldJobs.id, jobId));
    } else {
      await tx.update(yieldJobs).set({ runsDone: all.length, heartbeatAt: sql`now()` }).where(eq(yieldJobs.id, jobId));
    }
  });
}

/** Fails the job with the chunk's error (its last try), unless it already ended. */
export async function failJob(db: Database, jobId: string, message: string): Promise<void> {
  await db.update(yieldJobs).set({ status: 'failed', error: message }).where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.status, 'running')));
}
