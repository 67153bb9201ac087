/** Entry of a stand-alone queue worker (`hexloom worker`): opens the shared database and takes yield chunks until stopped. */
import { openServerDatabase } from '../db/migrate.js';
import { startQueueWorker, type QueueWorkerOptions } from './queue-worker.js';

export type WorkerRun = { stop: () => Promise<void> };

/** Connects to `databaseUrl` (migrating it if needed, under the startup lock) and starts taking chunks. */
export async function runQueueWorker(options: { databaseUrl: string; threads?: number; onChunk?: QueueWorkerOptions['onChunk'] }): Promise<WorkerRun> {
  const database = await openServerDatabase(options.databaseUrl);
  try {
    const worker = await startQueueWorker({ databaseUrl: options.databaseUrl, db: database.db, ...(options.threads ? { threads: options.threads } : {}), ...(options.onChunk ? { onChunk: options.onChunk } : {}) });
    return {
      stop: async () => {
        await worker.stop();
        await database.close();
      },
    };
  } catch (error) {
    await database.close();
    throw error;
  }
}
