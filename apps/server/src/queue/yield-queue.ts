/** The shared queue of yield-job chunks (pg-boss on the PostgreSQL server database): its name, messages and options. */
import type { YieldChunkTask } from '@hexloom/synth';

/** Queue of Monte Carlo chunks; any server or `hexloom worker` on the database takes from it. */
export const YIELD_CHUNK_QUEUE = 'hexloom-yield-chunks';

/** One chunk to run: its job, its place in the job, and the plain-data task the chunk runner takes. */
export type ChunkMessage = { jobId: string; chunkIndex: number; task: YieldChunkTask };

/** Tries of one chunk before its job is failed. */
export const CHUNK_RETRY_LIMIT = 3;

/**
 * `chunkExpireSeconds`: a chunk taken by a worker that vanished (killed machine) goes to another worker after this long,
 * found by the queue's tidy-up that runs every `maintenanceSeconds` on some connected server or worker.
 */
export type QueueTiming = { chunkExpireSeconds: number; maintenanceSeconds: number };

/** A chunk takes seconds, so ten minutes leaves room for slow machines; the tidy-up runs each minute. */
export const DEFAULT_QUEUE_TIMING: QueueTiming = { chunkExpireSeconds: 600, maintenanceSeconds: 60 };
