// Rate limits: sign-in routes per address and compute routes per user answer 429 past their limit, and other routes do not count.
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { type Agent, signIn } from './support/sign-in.js';
import { demoTeamId, startTestApp } from './support/test-app.js';

describe('rate limits', () => {
  let sut: INestApplication;
  let noor: Agent;
  let base = '';
  let ports: { west: string[]; east: string[] };

  beforeAll(async () => {
    sut = await startTestApp({ rateLimits: { signInPerMinute: 8, computePerMinute: 5 } });
    noor = (await signIn(sut, { login: 'noor' })).agent;
    const teamId = await demoTeamId(sut);
    const chip: Chip = await createChip(noor, teamId, 'limited', 2, 3);
    ports = sidePorts(chip.definition);
    const created = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'limited' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${created.id}/versions/1`;
  });
  afterAll(async () => {
    await sut.close();
  });

  it('answers 429 to the sixth compute call of a user within a minute, and still serves reads', async () => {
    const body = { from: ports.west[0], to: ports.east[0], grid: { kind: 'fsr', points: 16 } };
    const statuses: number[] = [];
    for (let k = 0; k < 6; k++) statuses.push((await noor.post(`${base}/simulate`).send(body)).status);
    expect(statuses).toEqual([200, 200, 200, 200, 200, 429]);
    expect((await noor.get(base)).status).toBe(200);
  });

  it('answers 429 to sign-in attempts from one address past the limit (counted per sign-in route)', async () => {
    const statuses: number[] = [];
    // The sign-in above used one of the 8 logins a minute.
    for (let k = 0; k < 8; k++) statuses.push((await request(sut.getHttpServer()).get('/api/auth/login')).status);
    expect(statuses).toEqual([302, 302, 302, 302, 302, 302, 302, 429]);
  });
});
