// Cross-site request forgery: state-changing requests from another site's page are refused, same-site ones work.
import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Chip } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { type Agent, signIn } from './support/sign-in.js';
import { auditCount, demoTeamId, startTestApp } from './support/test-app.js';

const EVIL = 'https://evil.example';

describe('cross-site requests', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  let chip: Chip;

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(noor, teamId, 'csrf chip', 2, 3);
  });
  afterAll(async () => {
    await sut.close();
  });

  it('refuses JSON, form and multipart writes and a review decision from a foreign Origin, writing nothing', async () => {
    const before = await auditCount(sut);
    const json = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).set('Origin', EVIL).send({ name: 'forged' });
    const form = await noor.post(`/api/teams/${teamId}/invitations`).set('Origin', EVIL).type('form').send({ email: 'x@evil.example', role: 'owner' });
    const multipart = await noor.put(`/api/teams/${teamId}/chips/${chip.id}/calibration`).set('Origin', EVIL).attach('file', Buffer.from('gate,shifter\n'), 'c.csv');
    const decision = await noor.post(`/api/teams/${teamId}/configurations/00000000-0000-4000-8000-000000000000/versions/1/decision`).set('Origin', EVIL).send({ decision: 'approve' });
    for (const r of [json, form, multipart, decision]) {
      expect(r.status).toBe(403);
      expect(r.body.message).toMatch(/Cross-site .* refused/);
    }
    expect(await auditCount(sut)).toBe(before);
  });

  it('refuses a write marked cross-site by the browser even without an Origin', async () => {
    expect((await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).set('Sec-Fetch-Site', 'cross-site').send({ name: 'forged' })).status).toBe(403);
  });

  it('lets the app\'s own origin and same-site requests write, and reads from anywhere', async () => {
    expect((await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).set('Origin', 'http://localhost:3000').set('Sec-Fetch-Site', 'same-origin').send({ name: 'own' })).status).toBe(201);
    expect((await noor.get(`/api/teams/${teamId}/chips`).set('Origin', EVIL)).status).toBe(200);
  });
});

describe('cross-site requests with an opaque origin', () => {
  let sut: INestApplication;
  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });
  it('takes a form post with Origin: null only when Fetch Metadata says it came from this site', async () => {
    const { agent } = await signIn(sut, { login: 'noor' });
    const teamId = await demoTeamId(sut);
    const chip = await createChip(agent, teamId, 'null origin chip', 2, 3);
    const path = `/api/teams/${teamId}/chips/${chip.id}/configurations`;
    expect((await agent.post(path).set('Origin', 'null').set('Sec-Fetch-Site', 'cross-site').send({ name: 'forged' })).status).toBe(403);
    expect((await agent.post(path).set('Origin', 'null').send({ name: 'forged' })).status).toBe(403);
    expect((await agent.post(path).set('Origin', 'null').set('Sec-Fetch-Site', 'same-origin').send({ name: 'own form' })).status).toBe(201);
  });
});
