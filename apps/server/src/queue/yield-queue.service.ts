/** The shared yield queue in PostgreSQL server mode: sends a job's chunks, and runs this server's queue worker. */
import { Inject, Injectable, Logger, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import type PgBoss from 'pg-boss';
import type { YieldChunkTask } from '@hexloom/synth';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { DATABASE, type Database } from '../db/database.js';
import { OPEN_DATABASE } from '../db/database.module.js';
import type { OpenDatabase } from '../db/migrate.js';
import { startQueue, startQueueWorker, type QueueWorker } from './queue-worker.js';
import { CHUNK_RETRY_LIMIT, type ChunkMessage, YIELD_CHUNK_QUEUE } from './yield-queue.js';

@Injectable()
export class YieldQueueService implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('YieldQueue');
  private boss: PgBoss | null = null;
  private worker: QueueWorker | null = null;

  constructor(
    @Inject(OPEN_DATABASE) private readonly open: OpenDatabase,
    @Inject(DATABASE) private readonly db: Database,
    @Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions,
  ) {}

  /** Whether yield jobs go through the shared queue (a PostgreSQL server database) rather than this server's threads. */
  get shared(): boolean {
    return this.open.mode === 'server' && this.options.databaseUrl !== null;
  }

  async onModuleInit(): Promise<void> {
    if (!this.shared || !this.options.databaseUrl) return;
    this.boss = await startQueue(this.options.databaseUrl, this.options.queueTiming, (error) => this.logger.warn(`shared queue: ${error.message}`));
    if (this.options.queueWorker) this.worker = await startQueueWorker({ databaseUrl: this.options.databaseUrl, db: this.db, threads: 2, timing: this.options.queueTiming });
    this.logger.log(`Yield jobs go through the shared queue on the database${this.options.queueWorker ? '; this server takes chunks too' : ''}`);
  }

  /** Puts every chunk of job `jobId` on the queue. */
  async enqueue(jobId: string, tasks: readonly YieldChunkTask[]): Promise<void> {
    if (!this.boss) throw new Error('YieldQueueService.enqueue: the shared queue is not running (embedded database)');
    const jobs = tasks.map((task, chunkIndex): PgBoss.JobInsert<ChunkMessage> => ({ name: YIELD_CHUNK_QUEUE, data: { jobId, chunkIndex, task }, retryLimit: CHUNK_RETRY_LIMIT, expireInSeconds: this.options.queueTiming.chunkExpireSeconds }));
    await this.boss.insert(jobs);
  }

  async onApplicationShutdown(): Promise<void> {
    await this.worker?.stop();
    await this.boss?.stop({ graceful: true, wait: true, timeout: 10_000 });
    this.worker = null;
    this.boss = null;
  }
}
