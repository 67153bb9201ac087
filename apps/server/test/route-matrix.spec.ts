// Every API route walked by every kind of caller: 401 / 403 / 2xx, and no side effect when refused.
import type { INestApplication } from '@nestjs/common';
import { apiErrorSchema } from '@hexloom/contracts';
import { and, eq } from 'drizzle-orm';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations, memberships } from '../src/db/schema/index.js';
import { signInActors, type Actor } from './support/actors.js';
import type { Agent } from './support/sign-in.js';
import { auditCount, databaseOf, demoTeamId, startTestApp, userIdOf } from './support/test-app.js';


/** Owner last, so a successful destructive call comes after every refused one. */
const ACTORS: readonly Actor[] = ['anonymous', 'outsider', 'viewer', 'reviewer', 'designer', 'owner'];

type Ctx = { teamId: string; tobinId: string; maelleId: string; invitationId: string; n: number };

type RouteCase = {
  route: string;
  call: (agent: Agent, ctx: Ctx) => request.Test;
  expected: Record<Actor, number>;
  /** Asserted after the refused calls: the change they asked for did not happen. */
  unchanged?: (ctx: Ctx) => Promise<void>;
};

const everyone = (status: number): Record<Actor, number> =>
  Object.fromEntries(ACTORS.map((a) => [a, status])) as Record<Actor, number>;
const signedIn = (status: number): Record<Actor, number> => ({ ...everyone(status), anonymous: 401 });
const members = (status: number): Record<Actor, number> => ({ ...signedIn(status), outsider: 403 });
const owners = (status: number): Record<Actor, number> => ({ ...members(403), owner: status });

describe('route x role matrix', () => {
  let sut: INestApplication;
  const agents = {} as Record<Actor, Agent>;
  const ctx: Ctx = { teamId: '', tobinId: '', maelleId: '', invitationId: '', n: 0 };

  beforeAll(async () => {
    sut = await startTestApp();
    Object.assign(agents, (await signInActors(sut)).agents);
    ctx.teamId = await demoTeamId(sut);
    ctx.tobinId = await userIdOf(sut, 'tobin');
    ctx.maelleId = await userIdOf(sut, 'maelle');
    const invitation = await agents.owner
      .post(`/api/teams/${ctx.teamId}/invitations`)
      .send({ email: 'to-revoke@kestrel-vale.example', role: 'viewer' })
      .expect(201);
    ctx.invitationId = invitation.body.id as string;
  });
  afterAll(async () => {
    await sut.close();
  });

  const roleOf = async (userId: string): Promise<string | undefined> => {
    const [row] = await databaseOf(sut)
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.teamId, ctx.teamId), eq(memberships.userId, userId)));
    return row?.role;
  };

  const cases: RouteCase[] = [
    { route: 'GET /api/health', call: (a) => a.get('/api/health'), expected: everyone(200) },
    { route: 'GET /api/auth/providers', call: (a) => a.get('/api/auth/providers'), expected: everyone(200) },
    { route: 'GET /api/auth/login', call: (a) => a.get('/api/auth/login?returnTo=/x'), expected: everyone(302) },
    { route: 'GET /api/docs-json', call: (a) => a.get('/api/docs-json'), expected: everyone(200) },
    { route: 'GET /api/auth/callback (no code, no state)', call: (a) => a.get('/api/auth/callback'), expected: everyone(400) },
    {
      route: 'GET /api/local-idp/authorize',
      call: (a) => a.get('/api/local-idp/authorize?client_id=hexloom-local&state=s&redirect_uri=http%3A%2F%2Flocalhost%3A3000%2Fapi%2Fauth%2Fcallback'),
      expected: everyone(200),
    },
    { route: 'GET /api/local-idp/user (no bearer token)', call: (a) => a.get('/api/local-idp/user'), expected: everyone(401) },
    { route: 'GET /api/me', call: (a) => a.get('/api/me'), expected: signedIn(200) },
    { route: 'GET /api/figures', call: (a) => a.get('/api/figures'), expected: signedIn(200) },
    { route: 'GET /api/teams', call: (a) => a.get('/api/teams'), expected: signedIn(200) },
    {
      route: 'POST /api/teams',
      call: (a, c) => a.post('/api/teams').send({ name: `Matrix team ${++c.n}` }),
      expected: signedIn(201),
    },
    { route: 'GET /api/teams/:teamId', call: (a, c) => a.get(`/api/teams/${c.teamId}`), expected: members(200) },
    { route: 'GET /api/teams/:teamId/members', call: (a, c) => a.get(`/api/teams/${c.teamId}/members`), expected: members(200) },
    {
      route: 'PATCH /api/teams/:teamId/members/:userId',
      call: (a, c) => a.patch(`/api/teams/${c.teamId}/members/${c.tobinId}`).send({ role: 'reviewer' }),
      expected: owners(200),
      unchanged: async (c) => expect(await roleOf(c.tobinId)).toBe('designer'),
    },
    {
      route: 'DELETE /api/teams/:teamId/members/:userId',
      call: (a, c) => a.delete(`/api/teams/${c.teamId}/members/${c.maelleId}`),
      expected: owners(204),
      unchanged: async (c) => expect(await roleOf(c.maelleId)).toBe('viewer'),
    },
    { route: 'GET /api/teams/:teamId/invitations', call: (a, c) => a.get(`/api/teams/${c.teamId}/invitations`), expected: owners(200) },
    {
      route: 'POST /api/teams/:teamId/invitations',
      call: (a, c) => a.post(`/api/teams/${c.teamId}/invitations`).send({ email: 'new-hire@kestrel-vale.example', role: 'designer' }),
      expected: owners(201),
      unchanged: async () =>
        expect(await databaseOf(sut).select().from(invitations).where(eq(invitations.email, 'new-hire@kestrel-vale.example'))).toEqual([]),
    },
    {
      route: 'DELETE /api/teams/:teamId/invitations/:invitationId',
      call: (a, c) => a.delete(`/api/teams/${c.teamId}/invitations/${c.invitationId}`),
      expected: owners(204),
      unchanged: async (c) => expect(await databaseOf(sut).select().from(invitations).where(eq(invitations.id, c.invitationId))).toHaveLength(1),
    },
    { route: 'GET /api/teams/:teamId/audit', call: (a, c) => a.get(`/api/teams/${c.teamId}/audit`), expected: owners(200) },
  ];

  for (const routeCase of cases) {
    it(`${routeCase.route} answers ${ACTORS.map((a) => `${a} ${routeCase.expected[a]}`).join(', ')}`, async () => {
      const refused = ACTORS.filter((a) => routeCase.expected[a] >= 400);
      const allowed = ACTORS.filter((a) => routeCase.expected[a] < 400);
      const auditBefore = await auditCount(sut);
      for (const actor of refused) {
        const res = await routeCase.call(agents[actor], ctx);
        expect({ actor, status: res.status }).toEqual({ actor, status: routeCase.expected[actor] });
        expect(apiErrorSchema.parse(res.body).statusCode).toBe(routeCase.expected[actor]);
      }
      await routeCase.unchanged?.(ctx);
      expect(await auditCount(sut)).toBe(auditBefore);
      for (const actor of allowed) {
        const res = await routeCase.call(agents[actor], ctx);
        expect({ actor, status: res.status }).toEqual({ actor, status: routeCase.expected[actor] });
      }
    });
  }

  it('records an audit event for each allowed change above, with the owner as actor', async () => {
    const res = await agents.owner.get(`/api/teams/${ctx.teamId}/audit`).expect(200);
    const events = res.body as { action: string; actor: string | null; target: string | null }[];
    expect(events.slice(0, 5).map((e) => [e.action, e.actor, e.target])).toEqual([
      ['invitation.revoked', 'ilse', 'to-revoke@kestrel-vale.example'],
      ['invitation.created', 'ilse', 'new-hire@kestrel-vale.example'],
      ['member.removed', 'ilse', 'maelle'],
      ['member.role_changed', 'ilse', 'tobin'],
      ['invitation.created', 'ilse', 'to-revoke@kestrel-vale.example'],
    ]);
  });

  it('POST /api/auth/logout answers everyone 204, after which nobody is signed in', async () => {
    for (const actor of ACTORS) {
      const res = await agents[actor].post('/api/auth/logout');
      expect({ actor, status: res.status }).toEqual({ actor, status: 204 });
    }
    for (const actor of ACTORS) {
      const res = await agents[actor].get('/api/me');
      expect({ actor, status: res.status }).toEqual({ actor, status: 401 });
    }
  });
});
