// Property-based fuzzing of route bodies and query strings: never a 500, and a refused request writes nothing.
import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import { count, type Table } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../src/db/schema/index.js';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { type Agent, signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

const RUNS = 60;
const tables: Table[] = [schema.chips, schema.configurations, schema.configurationVersions, schema.comments, schema.reviews, schema.invitations, schema.measurements, schema.calibrations, schema.yieldJobs, schema.teams];

/** A body near `valid`: members replaced by arbitrary JSON (odd text, huge numbers, deep values) or dropped, or any JSON. */
const near = (valid: Record<string, unknown>) =>
  fc.oneof(
    { weight: 3, arbitrary: fc.tuple(fc.subarray(Object.keys(valid), { minLength: 1 }), fc.array(fc.oneof(fc.jsonValue({ maxDepth: 3 }), fc.string({ unit: 'binary' }), fc.constantFrom(2 ** 31, -1, 1e308, 0.5, '', '\u0000', '\ud800', 'a\nb')), { minLength: 1, maxLength: 4 })).map(([keys, values]) => {
      const copy: Record<string, unknown> = structuredClone(valid);
      keys.forEach((k, i) => {
        const v = values[i % values.length];
        if (i % 5 === 4) delete copy[k];
        else copy[k] = v;
      });
      return copy as unknown;
    }) },
    { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) },
  );

describe('fuzzed requests', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  let chip: Chip;
  let base = '';
  let ports: { west: string[]; east: string[] };
  let fuzzed = 0;

  const rowCounts = async (): Promise<number[]> => Promise.all(tables.map(async (t) => (await databaseOf(sut).select({ n: count() }).from(t))[0]?.n ?? 0));

  beforeAll(async () => {
    sut = await startTestApp({ rateLimits: { signInPerMinute: 10_000, computePerMinute: 100_000 } });
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(noor, teamId, 'fuzz chip', 2, 3);
    ports = sidePorts(chip.definition);
    const created = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'fuzz' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${created.id}`;
  });
  afterAll(async () => {
    await sut.close();
  });

  const bodyRoutes: { name: string; method: 'post' | 'patch' | 'put'; path: () => string; valid: () => Record<string, unknown> }[] = [
    { name: 'POST /chips', method: 'post', path: () => `/api/teams/${teamId}/chips`, valid: () => ({ name: 'c', template: { rows: 2, columns: 3 }, technology: chip.definition.technology }) },
    { name: 'PATCH /chips/:id', method: 'patch', path: () => `/api/teams/${teamId}/chips/${chip.id}`, valid: () => ({ name: 'renamed', deadGates: [] }) },
    { name: 'POST configurations', method: 'post', path: () => `/api/teams/${teamId}/chips/${chip.id}/configurations`, valid: () => ({ name: 'x', note: 'n' }) },
    { name: 'POST versions', method: 'post', path: () => `${base}/versions`, valid: () => ({ baseVersion: 1, content: { schemaVersion: 1, mesh: chip.definition, parkedState: 'bar', gates: [], circuits: [] }, note: 'n' }) },
    { name: 'POST simulate', method: 'post', path: () => `${base}/versions/1/simulate`, valid: () => ({ from: ports.west[0], to: ports.east[0], grid: { kind: 'fsr', points: 16 } }) },
    { name: 'POST mask-check', method: 'post', path: () => `${base}/versions/1/mask-check`, valid: () => ({ from: ports.west[0], to: ports.east[0], grid: { kind: 'fsr', points: 16 }, mask: { regions: [] } }) },
    { name: 'POST circuits', method: 'post', path: () => `${base}/versions/1/circuits`, valid: () => ({ request: { kind: 'path', id: 'p', from: ports.west[0], to: ports.east[0] } }) },
    { name: 'POST comments', method: 'post', path: () => `${base}/versions/1/comments`, valid: () => ({ body: 'hello', anchor: { fromHz: 1, toHz: 2 } }) },
    { name: 'POST reviews', method: 'post', path: () => `${base}/versions/1/reviews`, valid: () => ({ reviewers: ['caspar'], message: 'm' }) },
    { name: 'POST invitations', method: 'post', path: () => `/api/teams/${teamId}/invitations`, valid: () => ({ email: 'a@b.example', role: 'viewer' }) },
    { name: 'POST teams', method: 'post', path: () => '/api/teams', valid: () => ({ name: 'Fuzz team' }) },
  ];

  for (const r of bodyRoutes) {
    it(`never answers 500 to ${r.name}, and writes nothing when it refuses`, async () => {
      await fc.assert(
        fc.asyncProperty(near(r.valid()), async (body) => {
          const before = await rowCounts();
          const res = await noor[r.method](r.path()).set('content-type', 'application/json').send(JSON.stringify(body));
          fuzzed++;
          expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBeLessThan(500);
          if (res.status >= 400) {
            expect(res.body).toMatchObject({ statusCode: res.status, message: expect.any(String) });
            expect(await rowCounts()).toEqual(before);
          }
        }),
        { numRuns: RUNS, seed: 17 },
      );
    }, 120_000);
  }

  it('never answers 500 to fuzzed query strings and path segments', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ unit: 'grapheme', maxLength: 40 }), fc.string({ unit: 'binary', maxLength: 20 }), async (a, b) => {
        const q = encodeURIComponent(a);
        const paths = [`${base}/diff?from=${q}&to=${encodeURIComponent(b)}`, `/api/teams/${teamId}/audit?limit=${q}`, `${base}/versions/1/touchstone?ports=${q}&startOffsetHz=${encodeURIComponent(b)}&stopOffsetHz=1e9&points=4`, `${base}/versions/${q || 'x'}`, `/api/teams/${q || 'x'}/chips`];
        for (const p of paths) {
          const res = await noor.get(p);
          fuzzed++;
          expect(res.status, `${p}: ${JSON.stringify(res.body).slice(0, 200)}`).toBeLessThan(500);
        }
      }),
      { numRuns: RUNS, seed: 23 },
    );
  }, 120_000);

  it('fuzzed at least a few hundred requests', () => {
    expect(fuzzed).toBeGreaterThan(RUNS * bodyRoutes.length);
  });
});
