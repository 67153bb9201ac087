// 400 answers name the offending fields; unknown routes and ids answer 404 JSON.
import type { INestApplication } from '@nestjs/common';
import { apiErrorSchema } from '@hexloom/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type Agent, signIn } from './support/sign-in.js';
import { auditCount, demoTeamId, startTestApp, userIdOf } from './support/test-app.js';

const UNKNOWN_ID = '00000000-0000-4000-8000-000000000000';

describe('validation and not-found answers', () => {
  let sut: INestApplication;
  let owner: Agent;
  let teamId = '';
  let noorId = '';

  beforeAll(async () => {
    sut = await startTestApp();
    owner = (await signIn(sut, { login: 'ilse' })).agent;
    teamId = await demoTeamId(sut);
    noorId = await userIdOf(sut, 'noor');
  });
  afterAll(async () => {
    await sut.close();
  });

  /** Sends the request and returns the sorted issue paths of its 400 answer. */
  const issuePaths = async (req: request.Test): Promise<string[]> => {
    const res = await req;
    expect(res.status).toBe(400);
    const body = apiErrorSchema.parse(res.body);
    expect(body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
    return (body.issues ?? []).map((i) => i.path).sort();
  };

  const cases: { route: string; call: () => request.Test; paths: string[] }[] = [
    { route: 'POST /api/teams (empty body)', call: () => owner.post('/api/teams').send({}), paths: ['name'] },
    { route: 'POST /api/teams (bad slug)', call: () => owner.post('/api/teams').send({ name: 'X', slug: 'Bad Slug' }), paths: ['name', 'slug'] },
    { route: 'GET /api/teams/:teamId', call: () => owner.get('/api/teams/not-a-uuid'), paths: ['teamId'] },
    { route: 'GET /api/teams/:teamId/members', call: () => owner.get('/api/teams/42/members'), paths: ['teamId'] },
    {
      route: 'PATCH /api/teams/:teamId/members/:userId (bad user id)',
      call: () => owner.patch(`/api/teams/${teamId}/members/nope`).send({ role: 'viewer' }),
      paths: ['userId'],
    },
    {
      route: 'PATCH /api/teams/:teamId/members/:userId (bad role)',
      call: () => owner.patch(`/api/teams/${teamId}/members/${noorId}`).send({ role: 'admin' }),
      paths: ['role'],
    },
    { route: 'DELETE /api/teams/:teamId/members/:userId', call: () => owner.delete(`/api/teams/${teamId}/members/nope`), paths: ['userId'] },
    { route: 'GET /api/teams/:teamId/invitations', call: () => owner.get('/api/teams/x/invitations'), paths: ['teamId'] },
    {
      route: 'POST /api/teams/:teamId/invitations',
      call: () => owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'not-an-address', role: 'boss' }),
      paths: ['email', 'role'],
    },
    {
      route: 'DELETE /api/teams/:teamId/invitations/:invitationId',
      call: () => owner.delete(`/api/teams/${teamId}/invitations/123`),
      paths: ['invitationId'],
    },
    { route: 'GET /api/teams/:teamId/audit (limit 0)', call: () => owner.get(`/api/teams/${teamId}/audit?limit=0`), paths: ['limit'] },
    { route: 'GET /api/teams/:teamId/audit (limit abc)', call: () => owner.get(`/api/teams/${teamId}/audit?limit=abc`), paths: ['limit'] },
    { route: 'GET /api/auth/login', call: () => owner.get('/api/auth/login?returnTo=https://evil.example'), paths: ['returnTo'] },
    { route: 'GET /api/auth/callback', call: () => owner.get('/api/auth/callback'), paths: ['code', 'state'] },
    { route: 'GET /api/local-idp/authorize', call: () => owner.get('/api/local-idp/authorize'), paths: ['client_id', 'redirect_uri', 'state'] },
    {
      route: 'POST /api/local-idp/authorize',
      call: () =>
        owner
          .post('/api/local-idp/authorize')
          .type('form')
          .send({ client_id: 'hexloom-local', redirect_uri: 'http://localhost:3000/api/auth/callback', state: 's', login: '-bad', email: 'x@' }),
      paths: ['email', 'login'],
    },
    { route: 'POST /api/local-idp/access_token', call: () => owner.post('/api/local-idp/access_token').send({}), paths: ['client_id', 'code'] },
  ];

  for (const c of cases) {
    it(`answers ${c.route} with 400 naming ${c.paths.join(', ')}`, async () => {
      expect(await issuePaths(c.call())).toEqual(c.paths);
    });
  }

  it('records no audit event for any rejected request', async () => {
    const before = await auditCount(sut);
    for (const c of cases) if (c.route.startsWith('POST /api/teams') || c.route.startsWith('PATCH') || c.route.startsWith('DELETE')) await c.call();
    expect(await auditCount(sut)).toBe(before);
  });

  it('answers an unknown /api route with 404 JSON, whatever the method', async () => {
    for (const res of [await request(sut.getHttpServer()).get('/api/no-such-thing'), await owner.post('/api/teams/x/y/z')]) {
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/^application\/json/);
      expect(apiErrorSchema.parse(res.body)).toMatchObject({ statusCode: 404, error: 'Not Found' });
    }
  });

  it('answers unknown team, member and invitation ids with 404 JSON', async () => {
    const answers = [
      await owner.get(`/api/teams/${UNKNOWN_ID}`),
      await owner.get(`/api/teams/${UNKNOWN_ID}/members`),
      await owner.patch(`/api/teams/${teamId}/members/${UNKNOWN_ID}`).send({ role: 'viewer' }),
      await owner.delete(`/api/teams/${teamId}/members/${UNKNOWN_ID}`),
      await owner.delete(`/api/teams/${teamId}/invitations/${UNKNOWN_ID}`),
    ];
    for (const res of answers) {
      expect(res.status).toBe(404);
      expect(apiErrorSchema.parse(res.body).message).toMatch(UNKNOWN_ID);
    }
  });
});
