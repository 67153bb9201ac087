// Yield jobs on a shared PostgreSQL database go through its queue: chunks wait for a worker, any server or
// `hexloom worker` takes them, a worker killed mid-chunk loses nothing (its chunk goes to another after its expiry), a
// server that stops mid-job leaves the rest to the others, a cancelled job's chunks are skipped, and a chunk that
// throws on every try fails its job. Each finished job
// must give the same summary as the same study run in-process on the embedded database (same seed, same chip).
import { type ChildProcess, spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { INestApplication } from '@nestjs/common';
import { type StartYieldJob, type YieldJob, yieldJobSchema } from '@hexloom/contracts';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { yieldChunkResults, yieldJobs } from '../src/db/schema/index.js';
import { startQueue } from '../src/queue/queue-worker.js';
import { runQueueWorker, type WorkerRun } from '../src/queue/worker-entry.js';
import { YIELD_CHUNK_QUEUE } from '../src/queue/yield-queue.js';
import type { Chip, ConfigurationDetail } from '../test/support/contract-types.js';
import { createChip } from '../test/support/demo-chip.js';
import { sidePorts } from '../test/support/side-ports.js';
import { type Agent, signIn } from '../test/support/sign-in.js';
import { databaseOf, demoTeamId, freshServerDatabase, startTestApp, userIdOf } from '../test/support/test-app.js';

const cli = fileURLToPath(new URL('../../cli/bin/hexloom.js', import.meta.url));
/** Short expiry so a killed worker's chunk comes back within the test (production: ten minutes). */
const timing = { chunkExpireSeconds: 4, maintenanceSeconds: 1 };

type Study = { agent: Agent; base: string };

/** A 2x3 chip with an empty configuration on `app`, the same on every app (so its studies compare). */
async function study(app: INestApplication): Promise<Study> {
  const agent = (await signIn(app, { login: 'noor' })).agent;
  const teamId = await demoTeamId(app);
  const chip: Chip = await createChip(agent, teamId, `queue chip ${Date.now()}`, 2, 3);
  const created = (await agent.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: `queue ${Date.now()}` }).expect(201)).body as ConfigurationDetail;
  return { agent, base: `/api/teams/${teamId}/configurations/${created.id}/versions/1` };
}

/** West and east ports of the 2x3 chip (the same on every app). */
let ports: { west: string[]; east: string[] } = { west: [], east: [] };

/** Starts a seeded study of `runs` runs from the first west port to the first east port. */
async function start(s: Study, runs: number): Promise<YieldJob> {
  const body = { from: ports.west[0], to: ports.east[0], grid: { kind: 'span', startOffsetHz: 0, stopOffsetHz: 1e9, points: 41 }, mask: { regions: [] }, runs, seed: 11, couplerSigmaRad: 0.02, phaseSigmaRad: 0.05 };
  return yieldJobSchema.parse((await s.agent.post(`${s.base}/yield-jobs`).send(body).expect(202)).body);
}

async function read(s: Study, id: string): Promise<YieldJob> {
  return yieldJobSchema.parse((await s.agent.get(`${s.base}/yield-jobs/${id}`).expect(200)).body);
}

/** The specs poll a job ten times a second: far above the compute rate limit a team gets. */
const POLLING = { signInPerMinute: 1_000, computePerMinute: 100_000 };

/** Polls the job until `until` holds (default: it ended), for at most `seconds`. */
async function waitFor(s: Study, id: string, until: (j: YieldJob) => boolean = (j) => j.status !== 'running', seconds = 90): Promise<YieldJob> {
  let job = await read(s, id);
  for (let i = 0; i < seconds * 10 && !until(job); i++) {
    await new Promise((r) => setTimeout(r, 100));
    job = await read(s, id);
  }
  return job;
}

/** `hexloom worker` in its own process, with its stderr kept. */
function spawnWorker(databaseUrl: string, threads: number): { child: ChildProcess; log: () => string } {
  let log = '';
  const child = spawn(process.execPath, [cli, 'worker', '--database-url', databaseUrl, '--threads', String(threads)], { stdio: ['ignore', 'ignore', 'pipe'] });
  child.stderr?.on('data', (b: Buffer) => (log += b.toString()));
  return { child, log: () => log };
}

async function chunkRows(app: INestApplication, jobId: string): Promise<number> {
  const [row] = await databaseOf(app).select({ n: count() }).from(yieldChunkResults).where(eq(yieldChunkResults.jobId, jobId));
  return row?.n ?? 0;
}

describe('yield jobs through the shared queue', () => {
  let databaseUrl = '';
  let a: INestApplication;
  let s: Study;
  /** Summaries of the same studies run in-process on the embedded database. */
  const reference = new Map<number, unknown>();

  beforeAll(async () => {
    const url = await freshServerDatabase();
    if (!url) throw new Error('HEXLOOM_TEST_DATABASE_URL is not set: run this suite through scripts/test.sh');
    databaseUrl = url;
    // This server takes no chunks itself: only the workers each test starts do.
    a = await startTestApp({ databaseUrl, queueWorker: false, queueTiming: timing, rateLimits: POLLING });
    s = await study(a);
    const chip = (await s.agent.get(s.base).expect(200)).body as { content: { mesh: Chip['definition'] } };
    ports = sidePorts(chip.content.mesh);
    const embedded = await startTestApp({ dataDir: 'memory' });
    try {
      const e = await study(embedded);
      for (const runs of [300, 1200]) {
        const done = await waitFor(e, (await start(e, runs)).id);
        expect(done.status).toBe('done');
        reference.set(runs, done.summary);
      }
    } finally {
      await embedded.close();
    }
  }, 180_000);
  afterAll(async () => {
    await a?.close();
  });

  it('keeps a job waiting while no worker runs, then a `hexloom worker` process finishes it; its stream on the server follows to the end', async () => {
    const job = await start(s, 300);
    await new Promise((r) => setTimeout(r, 1500));
    expect(await read(s, job.id)).toMatchObject({ status: 'running', runsDone: 0 });
    const events = s.agent
      .get(`${s.base}/yield-jobs/${job.id}/events`)
      .buffer(true)
      .parse((res, cb) => {
        let text = '';
        res.on('data', (b: Buffer) => (text += b.toString()));
        res.on('end', () => cb(null, text));
      })
      .then((r) => String(r.body));
    const worker = spawnWorker(databaseUrl, 2);
    try {
      const done = await waitFor(s, job.id);
      expect(done.status).toBe('done');
      expect(done.runsDone).toBe(300);
      expect(done.summary).toEqual(reference.get(300));
      const text = await events;
      expect(text).toMatch(/"status":"running"/);
      expect(text).toMatch(/"status":"done"/);
      expect(worker.log()).toMatch(new RegExp(`job ${job.id} chunk \\d+: \\d+ runs`));
    } finally {
      const exited = new Promise<number | null>((r) => worker.child.once('exit', (code) => r(code)));
      worker.child.kill('SIGINT');
      expect(await exited).toBe(0);
      expect(worker.log()).toMatch(/stopped after \d+ runs/);
    }
  }, 120_000);

  it('loses nothing when a worker is killed mid-job: another finishes it, each chunk stored once, same summary', async () => {
    const job = await start(s, 1200);
    const doomed = spawnWorker(databaseUrl, 1);
    const partway = await waitFor(s, job.id, (j) => j.runsDone > 0 || j.status !== 'running');
    doomed.child.kill('SIGKILL');
    await new Promise((r) => doomed.child.once('exit', r));
    expect(partway.status).toBe('running');
    const left = await read(s, job.id);
    expect(left.runsDone).toBeLessThan(1200);
    const rescuer: WorkerRun = await runQueueWorker({ databaseUrl, threads: 2 });
    try {
      const done = await waitFor(s, job.id);
      expect(done.status).toBe('done');
      expect(done.runsDone).toBe(1200);
      expect(done.summary).toEqual(reference.get(1200));
      const [row] = await databaseOf(a).select({ chunks: yieldJobs.chunkCount }).from(yieldJobs).where(eq(yieldJobs.id, job.id));
      expect(await chunkRows(a, job.id)).toBe(row?.chunks);
    } finally {
      await rescuer.stop();
    }
  }, 120_000);

  it('lets a server that stops mid-job leave the rest to another server', async () => {
    const job = await start(s, 1200);
    const first = await startTestApp({ databaseUrl, queueTiming: timing, rateLimits: POLLING });
    const partway = await waitFor(s, job.id, (j) => j.runsDone > 0 || j.status !== 'running');
    // A graceful stop finishes the chunks in hand and takes no more.
    await first.close();
    expect(partway.status).toBe('running');
    expect((await read(s, job.id)).status).toBe('running');
    const second = await startTestApp({ databaseUrl, queueTiming: timing, rateLimits: POLLING });
    try {
      const done = await waitFor(s, job.id);
      expect(done).toMatchObject({ status: 'done', runsDone: 1200 });
      expect(done.summary).toEqual(reference.get(1200));
    } finally {
      await second.close();
    }
  }, 120_000);

  it('skips the chunks of a cancelled job', async () => {
    const job = await start(s, 1200);
    expect((await s.agent.delete(`${s.base}/yield-jobs/${job.id}`).expect(200)).body.status).toBe('cancelled');
    const worker = await runQueueWorker({ databaseUrl, threads: 2 });
    try {
      // Wait until the queue holds none of the job's chunks, then check nothing ran.
      await new Promise((r) => setTimeout(r, 3000));
      expect(await read(s, job.id)).toMatchObject({ status: 'cancelled', runsDone: 0, summary: null });
      expect(await chunkRows(a, job.id)).toBe(0);
    } finally {
      await worker.stop();
    }
  }, 60_000);

  it('fails a job whose chunk throws in its thread on every try, naming the chunk, and keeps the worker serving', async () => {
    // A job row with one chunk, and that chunk's task broken (no configuration): the chunk runner throws.
    const version = (await s.agent.get(s.base).expect(200)).body as { id: string };
    const [row] = await databaseOf(a)
      .insert(yieldJobs)
      .values({ versionId: version.id, request: { runs: 10 } as StartYieldJob, runsTotal: 10, chunkCount: 1, createdBy: await userIdOf(a, 'noor') })
      .returning();
    if (!row) throw new Error('no job row');
    const boss = await startQueue(databaseUrl, timing);
    await boss.insert([{ name: YIELD_CHUNK_QUEUE, data: { jobId: row.id, chunkIndex: 0, task: { chunk: { index: 0, firstRun: 0, count: 10, seed: 1 } } }, retryLimit: 2 }]);
    await boss.stop({ graceful: true, wait: true });
    const worker = await runQueueWorker({ databaseUrl, threads: 2 });
    try {
      const failed = await waitFor(s, row.id);
      expect(failed.status).toBe('failed');
      expect(failed.error).toMatch(/^chunk 0: /);
      const next = await waitFor(s, (await start(s, 300)).id);
      expect(next).toMatchObject({ status: 'done', runsDone: 300 });
      expect(next.summary).toEqual(reference.get(300));
    } finally {
      await worker.stop();
    }
  }, 90_000);
});
