// Yield jobs cannot starve a server: per-team caps on running jobs, per-user caps on event streams, pushed progress,
// and a job left running by a stopped server is marked interrupted (its stream ends) when the server starts again.
import { mkdtempSync, rmSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { type YieldJob, yieldJobSchema } from '@hexloom/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { yieldJobs } from '../src/db/schema/index.js';
import { MAX_RUNNING_JOBS_PER_TEAM, MAX_STREAMS_PER_USER } from '../src/compute/yield-jobs.service.js';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import request from 'supertest';
import { type Agent, startSignIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

const dataDir = mkdtempSync(join(tmpdir(), 'hexloom-jobs-'));
afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

async function setUp(app: INestApplication): Promise<{ noor: Agent; cookie: string; base: string; versionId: string; body: Record<string, unknown> }> {
  const agent = request.agent(app.getHttpServer());
  const callback = await startSignIn(agent, { login: 'noor' }, '/');
  const done = await agent.get(callback).expect(302);
  const cookie = ([] as string[]).concat(done.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]).join('; ');
  const teamId = await demoTeamId(app);
  const chip: Chip = await createChip(agent, teamId, `jobs chip ${Date.now()}`, 2, 3);
  const ports = sidePorts(chip.definition);
  const created = (await agent.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: `jobs ${Date.now()}` }).expect(201)).body as ConfigurationDetail;
  const version = (await agent.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body as { id: string };
  const body = { from: ports.west[0], to: ports.east[0], grid: { kind: 'span', startOffsetHz: 0, stopOffsetHz: 1e9, points: 21 }, mask: { regions: [] }, runs: 20_000, seed: 1, couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 };
  return { noor: agent, cookie, base: `/api/teams/${teamId}/configurations/${created.id}/versions/1`, versionId: version.id, body };
}

/** Opens an event stream with a plain HTTP request and resolves when its headers arrive (status and the open request). */
function openStream(port: number, path: string, cookie: string): Promise<{ status: number; close: () => void; text: () => string; ended: Promise<void> }> {
  return new Promise((resolve, reject) => {
    let text = '';
    const req = httpRequest({ host: '127.0.0.1', port, path, headers: { cookie, accept: 'text/event-stream' } }, (res) => {
      let done: () => void = () => undefined;
      const ended = new Promise<void>((r) => (done = r));
      res.on('data', (b: Buffer) => (text += b.toString()));
      res.on('end', () => done());
      res.on('close', () => done());
      resolve({ status: res.statusCode ?? 0, close: () => req.destroy(), text: () => text, ended });
    });
    req.on('error', reject);
    req.end();
  });
}

describe('yield job limits', () => {
  it(`lets a team run ${MAX_RUNNING_JOBS_PER_TEAM} jobs at once and a user follow ${MAX_STREAMS_PER_USER} streams, refusing more with 429`, async () => {
    const app = await startTestApp();
    await app.listen(0, '127.0.0.1');
    const port = (app.getHttpServer().address() as AddressInfo).port;
    try {
      const { noor, cookie, base, body } = await setUp(app);
      const jobs: YieldJob[] = [];
      for (let k = 0; k < MAX_RUNNING_JOBS_PER_TEAM; k++) jobs.push(yieldJobSchema.parse((await noor.post(`${base}/yield-jobs`).send(body).expect(202)).body));
      const third = await noor.post(`${base}/yield-jobs`).send(body);
      expect(third.status).toBe(429);
      expect(third.body.message).toMatch(new RegExp(`at most ${MAX_RUNNING_JOBS_PER_TEAM}`));
      const streams = [];
      for (let k = 0; k < MAX_STREAMS_PER_USER; k++) streams.push(await openStream(port, `${base}/yield-jobs/${jobs[0]!.id}/events`, cookie));
      expect(streams.map((s) => s.status)).toEqual(new Array(MAX_STREAMS_PER_USER).fill(200));
      const extra = await openStream(port, `${base}/yield-jobs/${jobs[0]!.id}/events`, cookie);
      expect(extra.status).toBe(429);
      // Cancelling pushes the last event and ends every stream.
      for (const j of jobs) await noor.delete(`${base}/yield-jobs/${j.id}`).expect(200);
      await Promise.all(streams.map((s) => s.ended));
      for (const s of streams) expect(s.text()).toMatch(/"status":"cancelled"/);
      // The streams closed, so the user may follow again, and the team may start again.
      const again = await openStream(port, `${base}/yield-jobs/${jobs[1]!.id}/events`, cookie);
      expect(again.status).toBe(200);
      await again.ended;
      expect((await noor.post(`${base}/yield-jobs`).send({ ...body, runs: 4 })).status).toBe(202);
    } finally {
      await app.close();
    }
  }, 120_000);

  it('marks a job the last server left running as interrupted when the server starts, and its stream gives that and ends', async () => {
    let app = await startTestApp({ dataDir });
    const { base, versionId, noor } = await setUp(app);
    const me = (await noor.get('/api/me').expect(200)).body as { user: { id: string } };
    // A job row as a killed server leaves it: running, with no worker behind it.
    const [stuck] = await databaseOf(app).insert(yieldJobs).values({ versionId, request: {} as never, runsTotal: 10, createdBy: me.user.id }).returning({ id: yieldJobs.id });
    await app.close();
    app = await startTestApp({ dataDir });
    try {
      const [after] = await databaseOf(app).select().from(yieldJobs).where(eq(yieldJobs.id, stuck!.id));
      expect(after).toMatchObject({ status: 'interrupted', error: expect.stringMatching(/server stopped/) });
      const { noor: again } = await setUp(app);
      const events = await again.get(`${base}/yield-jobs/${stuck!.id}/events`).buffer(true).parse((res, cb) => {
        let text = '';
        res.on('data', (chunk: Buffer) => (text += chunk.toString()));
        res.on('end', () => cb(null, text));
      });
      expect(String(events.body)).toMatch(/"status":"interrupted"/);
    } finally {
      await app.close();
    }
  }, 120_000);
});
