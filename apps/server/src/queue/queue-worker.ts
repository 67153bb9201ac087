/**
 * A worker of the shared yield queue: takes chunks from pg-boss on the PostgreSQL server database, runs them on worker
 * threads, and writes their results. The team server runs one (unless told not to); `hexloom worker` runs more anywhere.
 */
import { availableParallelism } from 'node:os';
import pg from 'pg';
import PgBoss from 'pg-boss';
import { Piscina } from 'piscina';
import type { MonteCarloRun } from '@hexloom/synth';
import type { Database } from '../db/database.js';
import { chunkDone, failJob, jobWantsChunks, recordChunk } from './chunk-results.js';
import { CHUNK_RETRY_LIMIT, type ChunkMessage, DEFAULT_QUEUE_TIMING, type QueueTiming, YIELD_CHUNK_QUEUE } from './yield-queue.js';

/** The chunk runner file of the compute folder (.ts under tsx and the test runner, .js when built). */
const CHUNK_FILE = new URL(`../compute/yield-chunk.worker${import.meta.url.endsWith('.ts') ? '.ts' : '.js'}`, import.meta.url).href;

export type QueueWorkerOptions = {
  databaseUrl: string;
  db: Database;
  /** Chunks run at once, each on its own thread (default: the machine's cores). */
  threads?: number;
  timing?: QueueTiming;
  /** Called after each chunk: its job, its index, how many runs, how long. */
  onChunk?: (info: { jobId: string; chunkIndex: number; runs: number; seconds: number; skipped: boolean }) => void;
};

export type QueueWorker = { stop: () => Promise<void> };

/** Key of the advisory lock under which one process at a time installs or checks pg-boss's schema and queue. */
export const QUEUE_STARTUP_LOCK_KEY = 4_863_918;

/**
 * The pg-boss instance of a database, with the chunk queue created. Servers and workers starting together on a fresh
 * database would deadlock creating pg-boss's tables, so start-up runs under an advisory lock.
 */
export async function startQueue(databaseUrl: string, timing: QueueTiming = DEFAULT_QUEUE_TIMING, onError: (error: Error) => void = () => undefined): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 4, maintenanceIntervalSeconds: timing.maintenanceSeconds, monitorStateIntervalSeconds: timing.maintenanceSeconds });
  boss.on('error', onError);
  const lock = new pg.Client({ connectionString: databaseUrl });
  await lock.connect();
  try {
    await lock.query('select pg_advisory_lock($1)', [QUEUE_STARTUP_LOCK_KEY]);
    await boss.start();
    await boss.createQueue(YIELD_CHUNK_QUEUE, { name: YIELD_CHUNK_QUEUE, retryLimit: CHUNK_RETRY_LIMIT, expireInSeconds: timing.chunkExpireSeconds });
  } finally {
    await lock.query('select pg_advisory_unlock($1)', [QUEUE_STARTUP_LOCK_KEY]).catch(() => undefined);
    await lock.end();
  }
  return boss;
}

/** Starts taking chunks; `stop` finishes the chunks in hand and lets go of the queue. */
export async function startQueueWorker(options: QueueWorkerOptions): Promise<QueueWorker> {
  const threads = options.threads ?? Math.max(1, availableParallelism());
  const boss = await startQueue(options.databaseUrl, options.timing);
  const pool = new Piscina({ filename: CHUNK_FILE, maxThreads: threads, minThreads: 0, idleTimeout: 30_000, execArgv: ['--import', 'tsx'] });
  const handle = async (jobs: PgBoss.JobWithMetadata<ChunkMessage>[]): Promise<void> => {
    for (const job of jobs) {
      const { jobId, chunkIndex, task } = job.data;
      const started = performance.now();
      if (!(await jobWantsChunks(options.db, jobId)) || (await chunkDone(options.db, jobId, chunkIndex))) {
        options.onChunk?.({ jobId, chunkIndex, runs: 0, seconds: 0, skipped: true });
        continue;
      }
      try {
        const runs = (await pool.run(task)) as MonteCarloRun[];
        await recordChunk(options.db, jobId, chunkIndex, runs);
        options.onChunk?.({ jobId, chunkIndex, runs: runs.length, seconds: (performance.now() - started) / 1000, skipped: false });
      } catch (error) {
        // The last try fails the job with the reason; earlier ones let pg-boss try the chunk again.
        if (job.retryCount >= job.retryLimit) await failJob(options.db, jobId, `chunk ${chunkIndex}: ${error instanceof Error ? error.message : String(error)}`);
        throw error;
      }
    }
  };
  const ids: string[] = [];
  for (let k = 0; k < threads; k++) ids.push(await boss.work<ChunkMessage>(YIELD_CHUNK_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5, includeMetadata: true }, handle));
  return {
    stop: async () => {
      for (const id of ids) await boss.offWork({ id });
      await boss.stop({ graceful: true, wait: true, timeout: 30_000 });
      await pool.destroy();
    },
  };
}
