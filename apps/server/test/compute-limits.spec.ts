// Compute never holds the event loop, grids are capped, and the simulation cache is bounded and kept per team.
import type { INestApplication } from '@nestjs/common';
import { SERVER_MAX_FSR_POINTS, SERVER_MAX_SPAN_POINTS } from '@hexloom/contracts';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simulationCache } from '../src/db/schema/index.js';
import { CACHE_ENTRIES_PER_TEAM } from '../src/compute/simulation.service.js';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { type Agent, signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('compute on the team server', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  let chip: Chip;
  let ports: { west: string[]; east: string[] };
  let base = '';

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(noor, teamId, 'limits chip', 8, 12);
    ports = sidePorts(chip.definition);
    const created = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'limits' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${created.id}`;
  }, 60_000);
  afterAll(async () => {
    await sut.close();
  });

  it('answers a health check while a long synthesis runs (the compute runs on worker threads)', async () => {
    const spec = { schemaVersion: 1, name: 'set', spec: { kind: 'ttd-set', from: ports.west[12], outputs: [ports.east[4], ports.east[8], ports.east[12]], stepPs: 36.4, tolerancePs: 5 }, mask: { regions: [] } };
    let synthesisDoneAt = 0;
    const synthesis = noor
      .post(`${base}/versions/1/synthesise`)
      .send({ circuitId: 'set', spec })
      .then((r) => {
        synthesisDoneAt = performance.now();
        return r;
      });
    await new Promise((resolve) => setTimeout(resolve, 100));
    const started = performance.now();
    await noor.get('/api/health').expect(200);
    const healthDoneAt = performance.now();
    expect((await synthesis).status).toBe(200);
    expect(healthDoneAt).toBeLessThan(synthesisDoneAt);
    expect(healthDoneAt - started).toBeLessThan(1_000);
  }, 60_000);

  it('refuses grids above the server caps with a 400 naming the points', async () => {
    const fsr = await noor.post(`${base}/versions/1/simulate`).send({ from: ports.west[1], to: ports.east[1], grid: { kind: 'fsr', points: 4 * SERVER_MAX_FSR_POINTS } });
    expect(fsr.status).toBe(400);
    expect(JSON.stringify(fsr.body.issues)).toMatch(/grid\.points/);
    const span = await noor.post(`${base}/versions/1/simulate`).send({ from: ports.west[1], to: ports.east[1], grid: { kind: 'span', startOffsetHz: -1e9, stopOffsetHz: 1e9, points: SERVER_MAX_SPAN_POINTS + 1 } });
    expect(span.status).toBe(400);
  });

  it('keeps the cache per team: another team with the same content misses, and says nothing of the first', async () => {
    const body = { from: ports.west[1], to: ports.east[1], grid: { kind: 'fsr', points: 64 } };
    expect((await noor.post(`${base}/versions/1/simulate`).send(body).expect(200)).headers['x-hexloom-cache']).toBe('miss');
    expect((await noor.post(`${base}/versions/1/simulate`).send(body).expect(200)).headers['x-hexloom-cache']).toBe('hit');
    const other = (await noor.post('/api/teams').send({ name: 'Other bench group', slug: 'other-bench' }).expect(201)).body as { id: string };
    const otherChip = (await noor.post(`/api/teams/${other.id}/chips`).send({ definition: chip.definition }).expect(201)).body as Chip;
    const created = (await noor.post(`/api/teams/${other.id}/chips/${otherChip.id}/configurations`).send({ name: 'limits' }).expect(201)).body as ConfigurationDetail;
    const res = await noor.post(`/api/teams/${other.id}/configurations/${created.id}/versions/1/simulate`).send(body).expect(200);
    expect(res.headers['x-hexloom-cache']).toBe('miss');
  });

  it(`keeps at most ${CACHE_ENTRIES_PER_TEAM} answers per team, dropping the least recently used`, async () => {
    for (let k = 0; k < CACHE_ENTRIES_PER_TEAM + 6; k++) {
      await noor.post(`${base}/versions/1/simulate`).send({ from: ports.west[2], to: ports.east[2], grid: { kind: 'span', startOffsetHz: 0, stopOffsetHz: 1e9, points: 2 + k } }).expect(200);
    }
    const [row] = await databaseOf(sut).select({ n: count() }).from(simulationCache).where(eq(simulationCache.teamId, teamId));
    expect(row?.n).toBe(CACHE_ENTRIES_PER_TEAM);
    const first = await noor.post(`${base}/versions/1/simulate`).send({ from: ports.west[2], to: ports.east[2], grid: { kind: 'span', startOffsetHz: 0, stopOffsetHz: 1e9, points: 2 } }).expect(200);
    expect(first.headers['x-hexloom-cache']).toBe('miss');
  }, 120_000);
});
