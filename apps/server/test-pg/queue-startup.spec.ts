// Several servers and workers starting at once on a fresh PostgreSQL database all get the shared queue: pg-boss's
// schema is installed once, under an advisory lock, instead of deadlocking (seen with two servers started together).
import { describe, expect, it } from 'vitest';
import { startQueue } from '../src/queue/queue-worker.js';
import { YIELD_CHUNK_QUEUE } from '../src/queue/yield-queue.js';
import { freshServerDatabase } from '../test/support/test-app.js';

describe('the shared queue at start-up', () => {
  it('starts four pg-boss instances together on a fresh database without a deadlock', async () => {
    const databaseUrl = await freshServerDatabase();
    if (!databaseUrl) throw new Error('HEXLOOM_TEST_DATABASE_URL is not set: run this suite through scripts/test.sh');
    const bosses = await Promise.all(Array.from({ length: 4 }, () => startQueue(databaseUrl)));
    try {
      for (const boss of bosses) expect((await boss.getQueue(YIELD_CHUNK_QUEUE))?.name).toBe(YIELD_CHUNK_QUEUE);
    } finally {
      await Promise.all(bosses.map((b) => b.stop({ graceful: false, wait: true })));
    }
  }, 60_000);
});
