// Every team-server route walked by every kind of caller: 401 / 403 / 2xx, and no side effect when refused;
// a member of another team reads nothing of this team's chips, even through their own team's URL.
import type { INestApplication } from '@nestjs/common';
import { apiErrorSchema } from '@hexloom/contracts';
import { buildMesh, placeCircuit, type Configuration } from '@hexloom/mesh';
import { count, eq } from 'drizzle-orm';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calibrations, chips, comments, configurations, configurationVersions, measurements, yieldJobs } from '../src/db/schema/index.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { signInActors, type Actor } from './support/actors.js';
import type { Agent } from './support/sign-in.js';
import { auditCount, databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

const ACTORS: readonly Actor[] = ['anonymous', 'outsider', 'viewer', 'reviewer', 'designer', 'owner'];

type Ctx = {
  teamId: string; otherTeamId: string; chipId: string; configurationId: string; jobId: string; measurementId: string; commentId: string;
  from: string; to: string; content: Configuration | null; csv: string; measuredCsv: string;
};

type Table = typeof chips | typeof calibrations | typeof configurations | typeof configurationVersions | typeof comments | typeof measurements | typeof yieldJobs;

type RouteCase = {
  route: string;
  call: (agent: Agent, ctx: Ctx) => PromiseLike<request.Response>;
  expected: Record<Actor, number>;
  unchanged?: (ctx: Ctx) => Promise<void>;
  /** A table the refused calls must not add rows to. */
  table?: Table;
};

const signedIn = (status: number): Record<Actor, number> => ({ anonymous: 401, outsider: status, viewer: status, reviewer: status, designer: status, owner: status });
const members = (status: number): Record<Actor, number> => ({ ...signedIn(status), outsider: 403 });
const only = (roles: Actor[], status: number): Record<Actor, number> => {
  const out = members(403);
  for (const r of roles) out[r] = status;
  return out;
};

describe('team-server route x role matrix', () => {
  let sut: INestApplication;
  const agents = {} as Record<Actor, Agent>;
  const ctx: Ctx = { teamId: '', otherTeamId: '', chipId: '', configurationId: '', jobId: '', measurementId: '', commentId: '', from: '', to: '', content: null, csv: '', measuredCsv: '' };
  const db = () => databaseOf(sut);
  const rows = async (table: Table): Promise<number> =>
    (await db().select({ n: count() }).from(table))[0]?.n ?? -1;
  const cfg = (c: Ctx): string => `/api/teams/${c.teamId}/configurations/${c.configurationId}`;
  const v2 = (c: Ctx): string => `${cfg(c)}/versions/2`;

  beforeAll(async () => {
    sut = await startTestApp();
    const actors = await signInActors(sut);
    Object.assign(agents, actors.agents);
    ctx.otherTeamId = actors.otherTeamId;
    ctx.teamId = await demoTeamId(sut);
    const chip = await createChip(agents.owner, ctx.teamId, 'matrix chip', 2, 3);
    ctx.chipId = chip.id;
    const sides = sidePorts(chip.definition);
    ctx.from = sides.west[0] ?? '';
    ctx.to = sides.east[0] ?? '';
    const gate = buildMesh(chip.definition).gates[0]?.id ?? '';
    ctx.csv = `gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v\n"${gate}",theta,0,22,1200,80,12\n`;
    const created = await agents.owner.post(`/api/teams/${ctx.teamId}/chips/${ctx.chipId}/configurations`).send({ name: 'matrix' }).expect(201);
    ctx.configurationId = created.body.id as string;
    const v1 = (await agents.owner.get(`${cfg(ctx)}/versions/1`).expect(200)).body.content as Configuration;
    const placed = placeCircuit(v1, { id: 'bus', kind: 'path', from: ctx.from, to: ctx.to });
    if (!placed.ok) throw new Error(placed.message);
    ctx.content = placed.configuration;
    await agents.owner.post(`${cfg(ctx)}/versions`).send({ baseVersion: 1, content: ctx.content }).expect(201);
    await agents.owner.post(`${v2(ctx)}/reviews`).send({ reviewers: ['caspar'] }).expect(201);
    ctx.commentId = (await agents.owner.post(`${v2(ctx)}/comments`).send({ body: 'thread to resolve' }).expect(201)).body.id as string;
    const f0 = chip.definition.technology.referenceFrequencyHz;
    ctx.measuredCsv = `frequency_hz,amplitude_db\n${f0 - 1e9},-3\n${f0},-3.1\n${f0 + 1e9},-3.2\n`;
    const measured = await agents.owner.post(`${v2(ctx)}/measurements`).field('from', ctx.from).field('to', ctx.to).attach('file', Buffer.from(ctx.measuredCsv), 'm.csv').expect(201);
    ctx.measurementId = measured.body.id as string;
    const job = await agents.owner.post(`${v2(ctx)}/yield-jobs`).send(yieldBody(ctx)).expect(202);
    ctx.jobId = job.body.id as string;
    for (let i = 0; i < 200; i++) {
      if ((await agents.owner.get(`${v2(ctx)}/yield-jobs/${ctx.jobId}`)).body.status !== 'running') break;
      await new Promise((r) => setTimeout(r, 100));
    }
  }, 120_000);
  afterAll(async () => {
    await sut.close();
  });

  const yieldBody = (c: Ctx) => ({
    from: c.from, to: c.to, grid: { kind: 'span', startOffsetHz: -1e9, stopOffsetHz: 1e9, points: 5 },
    mask: { regions: [{ kind: 'pass', range: { fromHz: -1e9, toHz: 1e9 }, maxInsertionLossDb: 20 }] }, runs: 2, seed: 1, couplerSigmaRad: 0.01, phaseSigmaRad: 0.01,
  });
  const jobsSettled = async (): Promise<void> => {
    for (let i = 0; i < 200; i++) {
      const running = await db().select({ id: yieldJobs.id }).from(yieldJobs).where(eq(yieldJobs.status, 'running'));
      if (running.length === 0) return;
      await new Promise((r) => setTimeout(r, 100));
    }
  };
  const head = async (c: Ctx): Promise<number> => (await db().select({ h: configurations.headVersion }).from(configurations).where(eq(configurations.id, c.configurationId)))[0]?.h ?? 0;
  const v2Status = async (): Promise<string | undefined> =>
    (await db().select({ s: configurationVersions.status }).from(configurationVersions).where(eq(configurationVersions.configurationId, ctx.configurationId))).find(() => true)?.s;

  const cases: RouteCase[] = [
    { route: 'GET /outbox', call: (a, c) => a.get(`/api/teams/${c.teamId}/outbox`), expected: only(['owner'], 200) },
    { route: 'GET /chips', call: (a, c) => a.get(`/api/teams/${c.teamId}/chips`), expected: members(200) },
    {
      route: 'POST /chips',
      call: (a, c) => a.post(`/api/teams/${c.teamId}/chips`).send({ name: 'matrix made', template: { rows: 1, columns: 2 }, technology: { unitLengthUm: 650, groupIndex: 4.2, referenceFrequencyHz: 193.4e12, lossPerGateDb: 0.25, bendLossDb: 0, extinctionDb: 25, phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.08, maxVoltageV: 12 } } }),
      expected: only(['designer', 'owner'], 201),
      table: chips,
    },
    {
      route: 'POST /chips/import',
      call: async (a, c) => a.post(`/api/teams/${c.teamId}/chips/import`).attach('file', Buffer.from((await agents.owner.get(`/api/teams/${c.teamId}/chips/${c.chipId}/export`)).text), 'chip.json'),
      expected: only(['designer', 'owner'], 201),
      table: chips,
    },
    { route: 'GET /chips/:chipId', call: (a, c) => a.get(`/api/teams/${c.teamId}/chips/${c.chipId}`), expected: members(200) },
    {
      route: 'PATCH /chips/:chipId',
      call: (a, c) => a.patch(`/api/teams/${c.teamId}/chips/${c.chipId}`).send({ name: 'matrix chip' }),
      expected: only(['designer', 'owner'], 200),
      unchanged: async (c) => expect((await db().select({ r: chips.revision }).from(chips).where(eq(chips.id, c.chipId)))[0]?.r).toBe(1),
    },
    { route: 'GET /chips/:chipId/export', call: (a, c) => a.get(`/api/teams/${c.teamId}/chips/${c.chipId}/export`), expected: members(200) },
    {
      route: 'PUT /chips/:chipId/calibration',
      call: (a, c) => a.put(`/api/teams/${c.teamId}/chips/${c.chipId}/calibration`).attach('file', Buffer.from(c.csv), 'cal.csv'),
      expected: only(['designer', 'owner'], 200),
      table: calibrations,
    },
    { route: 'GET /chips/:chipId/calibration', call: (a, c) => a.get(`/api/teams/${c.teamId}/chips/${c.chipId}/calibration`), expected: members(200) },
    { route: 'GET /chips/:chipId/configurations', call: (a, c) => a.get(`/api/teams/${c.teamId}/chips/${c.chipId}/configurations`), expected: members(200) },
    {
      route: 'POST /chips/:chipId/configurations',
      call: (a, c) => a.post(`/api/teams/${c.teamId}/chips/${c.chipId}/configurations`).send({ name: 'matrix extra' }),
      expected: only(['designer', 'owner'], 201),
      table: configurations,
    },
    { route: 'GET /configurations/:id', call: (a, c) => a.get(cfg(c)), expected: members(200) },
    { route: 'GET /configurations/:id/versions/:number', call: (a, c) => a.get(`${v2(c)}`), expected: members(200) },
    { route: 'GET /configurations/:id/diff', call: (a, c) => a.get(`${cfg(c)}/diff?from=1&to=2`), expected: members(200) },
    {
      route: 'POST /configurations/:id/duplicate',
      call: (a, c) => a.post(`${cfg(c)}/duplicate`).send({ name: 'matrix copy', fromVersion: 2 }),
      expected: only(['designer', 'owner'], 201),
      table: configurations,
    },
    { route: 'GET .../reviews', call: (a, c) => a.get(`${v2(c)}/reviews`), expected: members(200) },
    { route: 'GET /reviews/waiting', call: (a, c) => a.get(`/api/teams/${c.teamId}/reviews/waiting`), expected: members(200) },
    { route: 'GET .../comments', call: (a, c) => a.get(`${v2(c)}/comments`), expected: members(200) },
    {
      route: 'POST .../comments',
      call: (a, c) => a.post(`${v2(c)}/comments`).send({ body: 'matrix comment' }),
      expected: only(['reviewer', 'designer', 'owner'], 201),
      table: comments,
    },
    {
      route: 'PATCH .../comments/:commentId',
      call: (a, c) => a.patch(`${v2(c)}/comments/${c.commentId}`).send({ resolved: true }),
      expected: only(['reviewer', 'designer', 'owner'], 200),
      unchanged: async (c) => expect((await db().select({ at: comments.resolvedAt }).from(comments).where(eq(comments.id, c.commentId)))[0]?.at).toBeNull(),
    },
    { route: 'POST .../simulate', call: (a, c) => a.post(`${v2(c)}/simulate`).send({ from: c.from, to: c.to, grid: { kind: 'fsr', points: 64 } }), expected: members(200) },
    {
      route: 'POST .../mask-check',
      call: (a, c) => a.post(`${v2(c)}/mask-check`).send({ from: c.from, to: c.to, grid: { kind: 'span', startOffsetHz: -1e9, stopOffsetHz: 1e9, points: 11 }, mask: { regions: [] } }),
      expected: members(200),
    },
    {
      route: 'POST .../synthesise',
      call: (a, c) =>
        a.post(`${v2(c)}/synthesise`).send({ circuitId: 'dl', spec: { schemaVersion: 1, name: 'dl', spec: { kind: 'delay-line', from: c.from, to: c.to, delay: { units: 40 } }, mask: { regions: [] } } }),
      expected: only(['designer', 'owner'], 200),
    },
    { route: 'POST .../circuits', call: (a, c) => a.post(`${v2(c)}/circuits`).send({ request: { id: 'extra', kind: 'path', from: c.to, to: c.from } }), expected: only(['designer', 'owner'], 200) },
    { route: 'POST .../circuits/:circuitId/remove', call: (a, c) => a.post(`${v2(c)}/circuits/bus/remove`), expected: only(['designer', 'owner'], 200) },
    {
      route: 'POST .../circuits/:circuitId/reroute',
      call: (a, c) => a.post(`${v2(c)}/circuits/bus/reroute`).send({ request: { id: 'bus', kind: 'path', from: c.from, to: c.to, metric: 'loss' } }),
      expected: only(['designer', 'owner'], 200),
    },
    { route: 'GET .../bench-export', call: (a, c) => a.get(`${v2(c)}/bench-export?format=csv`), expected: members(200) },
    { route: 'GET .../touchstone', call: (a, c) => a.get(`${v2(c)}/touchstone`).query({ ports: `${c.from};${c.to}`, startOffsetHz: -1e9, stopOffsetHz: 1e9, points: 3 }), expected: members(200) },
    { route: 'GET .../measurements', call: (a, c) => a.get(`${v2(c)}/measurements`), expected: members(200) },
    {
      route: 'POST .../measurements',
      call: (a, c) => a.post(`${v2(c)}/measurements`).field('from', c.from).field('to', c.to).attach('file', Buffer.from(c.measuredCsv), 'm.csv'),
      expected: only(['reviewer', 'designer', 'owner'], 201),
      table: measurements,
    },
    { route: 'GET .../measurements/:id/comparison', call: (a, c) => a.get(`${v2(c)}/measurements/${c.measurementId}/comparison`), expected: members(200) },
    {
      route: 'POST .../yield-jobs',
      // A team runs at most two jobs at once: let the earlier ones finish before the next role starts one.
      call: async (a, c) => {
        await jobsSettled();
        return a.post(`${v2(c)}/yield-jobs`).send(yieldBody(c));
      },
      expected: only(['reviewer', 'designer', 'owner'], 202),
      table: yieldJobs,
    },
    { route: 'GET .../yield-jobs/:jobId', call: (a, c) => a.get(`${v2(c)}/yield-jobs/${c.jobId}`), expected: members(200) },
    { route: 'GET .../yield-jobs/:jobId/events', call: (a, c) => a.get(`${v2(c)}/yield-jobs/${c.jobId}/events`), expected: members(200) },
    { route: 'DELETE .../yield-jobs/:jobId', call: (a, c) => a.delete(`${v2(c)}/yield-jobs/${c.jobId}`), expected: only(['reviewer', 'designer', 'owner'], 200) },
    {
      route: 'POST .../decision (caspar is the named reviewer, ilse the author)',
      call: (a, c) => a.post(`${v2(c)}/decision`).send({ decision: 'approve' }),
      expected: { ...only(['reviewer'], 200), designer: 403, owner: 403 },
      unchanged: async () => expect(await v2Status()).not.toBe('approved'),
    },
    {
      route: 'POST .../reviews',
      call: (a, c) => a.post(`${v2(c)}/reviews`).send({ reviewers: ['wen'] }),
      expected: only(['designer', 'owner'], 201),
    },
    {
      route: 'POST /configurations/:id/versions (based on the newest version)',
      call: async (a, c) => a.post(`${cfg(c)}/versions`).send({ baseVersion: await head(c), content: c.content }),
      expected: only(['designer', 'owner'], 201),
      table: configurationVersions,
    },
  ];

  for (const routeCase of cases) {
    it(`${routeCase.route} answers ${ACTORS.map((a) => `${a} ${routeCase.expected[a]}`).join(', ')}`, async () => {
      const refused = ACTORS.filter((a) => routeCase.expected[a] >= 400);
      const allowed = ACTORS.filter((a) => routeCase.expected[a] < 400);
      const auditBefore = await auditCount(sut);
      const rowsBefore = routeCase.table ? await rows(routeCase.table) : 0;
      for (const actor of refused) {
        const res = await routeCase.call(agents[actor], ctx);
        expect({ actor, status: res.status }).toEqual({ actor, status: routeCase.expected[actor] });
        expect(apiErrorSchema.parse(res.body).statusCode).toBe(routeCase.expected[actor]);
      }
      await routeCase.unchanged?.(ctx);
      if (routeCase.table) expect(await rows(routeCase.table)).toBe(rowsBefore);
      expect(await auditCount(sut)).toBe(auditBefore);
      for (const actor of allowed) {
        const res = await routeCase.call(agents[actor], ctx);
        expect({ actor, status: res.status, message: res.status >= 400 ? res.body.message : undefined }).toEqual({ actor, status: routeCase.expected[actor], message: undefined });
      }
    }, 60_000);
  }

  it('records every kind of team-server change in the audit log', async () => {
    const events = (await agents.owner.get(`/api/teams/${ctx.teamId}/audit?limit=500`).expect(200)).body as { action: string }[];
    const actions = new Set(events.map((e) => e.action));
    for (const action of [
      'chip.created', 'chip.updated', 'calibration.uploaded', 'configuration.created', 'configuration.duplicated', 'version.saved',
      'review.requested', 'review.decided', 'comment.created', 'comment.resolved', 'measurement.uploaded', 'yield_job.started',
    ]) {
      expect({ action, recorded: actions.has(action) }).toEqual({ action, recorded: true });
    }
  });

  it('gives a member of another team nothing of this team, even through their own team id', async () => {
    const other = `/api/teams/${ctx.otherTeamId}`;
    for (const path of [
      `/chips/${ctx.chipId}`,
      `/chips/${ctx.chipId}/export`,
      `/chips/${ctx.chipId}/calibration`,
      `/chips/${ctx.chipId}/configurations`,
      `/configurations/${ctx.configurationId}`,
      `/configurations/${ctx.configurationId}/versions/2`,
      `/configurations/${ctx.configurationId}/versions/2/comments`,
      `/configurations/${ctx.configurationId}/versions/2/bench-export`,
      `/configurations/${ctx.configurationId}/versions/2/measurements`,
      `/configurations/${ctx.configurationId}/versions/2/yield-jobs/${ctx.jobId}`,
    ]) {
      const res = await agents.outsider.get(`${other}${path}`);
      expect({ path, status: res.status }).toEqual({ path, status: 404 });
    }
    const listed = await agents.outsider.get(`${other}/chips`).expect(200);
    expect(listed.body).toEqual([]);
  });
});
