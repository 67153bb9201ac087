// Two Hexloom servers on one PostgreSQL database serve the same team: a session opened on one works on the other,
// stale saves are refused across them, and a review requested on one is decided on the other.
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Chip, ConfigurationDetail } from '../test/support/contract-types.js';
import { createChip } from '../test/support/demo-chip.js';
import { signIn, startSignIn } from '../test/support/sign-in.js';
import { demoTeamId, freshServerDatabase, startTestApp } from '../test/support/test-app.js';

describe('two servers on one PostgreSQL database', () => {
  let a: INestApplication;
  let b: INestApplication;

  beforeAll(async () => {
    const databaseUrl = await freshServerDatabase();
    if (!databaseUrl) throw new Error('HEXLOOM_TEST_DATABASE_URL is not set: run this suite through scripts/test.sh');
    // Both start together: the migrations and the demo seed run once, under the startup lock.
    [a, b] = await Promise.all([startTestApp({ databaseUrl }), startTestApp({ databaseUrl })]);
  }, 120_000);
  afterAll(async () => {
    await a?.close();
    await b?.close();
  });

  it('seeds the demo team once, whichever server started first', async () => {
    const noorA = (await signIn(a, { login: 'noor' })).agent;
    const teams = (await noorA.get('/api/teams').expect(200)).body as { slug: string }[];
    expect(teams.filter((t) => t.slug === 'kestrel-vale')).toHaveLength(1);
  });

  it('takes a session opened on one server on the other', async () => {
    const agent = request.agent(a.getHttpServer());
    const callback = await startSignIn(agent, { login: 'tobin' });
    const done = await agent.get(callback).expect(302);
    const cookie = ([] as string[]).concat(done.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]).join('; ');
    const me = await request(b.getHttpServer()).get('/api/me').set('cookie', cookie).expect(200);
    expect(me.body.user.login).toBe('tobin');
  });

  it('refuses a stale save on one server after a save on the other (409 with the newer version)', async () => {
    const noorA = (await signIn(a, { login: 'noor' })).agent;
    const noorB = (await signIn(b, { login: 'noor' })).agent;
    const teamId = await demoTeamId(a);
    const chip: Chip = await createChip(noorA, teamId, 'shared chip', 2, 3);
    const created = (await noorA.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'shared' }).expect(201)).body as ConfigurationDetail;
    const base = `/api/teams/${teamId}/configurations/${created.id}`;
    const v1 = (await noorB.get(`${base}/versions/1`).expect(200)).body as { content: unknown };
    const [first, second] = await Promise.all([
      noorA.post(`${base}/versions`).send({ baseVersion: 1, content: v1.content, note: 'from a' }),
      noorB.post(`${base}/versions`).send({ baseVersion: 1, content: v1.content, note: 'from b' }),
    ]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    const loser = first.status === 409 ? first : second;
    expect(loser.body.latest.number).toBe(2);
    // A review requested on one server is decided on the other.
    await noorA.post(`${base}/versions/2/reviews`).send({ reviewers: ['caspar'] }).expect(201);
    const caspar = (await signIn(b, { login: 'caspar' })).agent;
    const decided = await caspar.post(`${base}/versions/2/decision`).send({ decision: 'approve' });
    expect(decided.status).toBe(200);
    expect((await noorA.get(`${base}/versions/2`).expect(200)).body.status).toBe('approved');
  });
});
