// GET /api/teams/:teamId/reviews/waiting: the versions the signed-in member was asked to review and has not decided.
import type { INestApplication } from '@nestjs/common';
import { teamSchema, waitingReviewsSchema } from '@hexloom/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createChip } from './support/demo-chip.js';
import { type Agent, signIn } from './support/sign-in.js';
import { demoTeamId, startTestApp } from './support/test-app.js';

describe('reviews waiting for me', () => {
  let sut: INestApplication;
  let ilse: Agent;
  let noor: Agent;
  let caspar: Agent;
  let dario: Agent;
  let teamId = '';
  let configurationId = '';
  const waiting = async (agent: Agent, team = teamId) => waitingReviewsSchema.parse((await agent.get(`/api/teams/${team}/reviews/waiting`).expect(200)).body);

  beforeAll(async () => {
    sut = await startTestApp();
    ilse = (await signIn(sut, { login: 'ilse' })).agent;
    noor = (await signIn(sut, { login: 'noor' })).agent;
    caspar = (await signIn(sut, { login: 'caspar' })).agent;
    dario = (await signIn(sut, { login: 'dario' })).agent;
    teamId = await demoTeamId(sut);
    const chip = await createChip(noor, teamId, 'waiting chip', 2, 3);
    const created = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'Waiting notch' }).expect(201);
    configurationId = created.body.id as string;
    await noor.post(`/api/teams/${teamId}/configurations/${configurationId}/versions/1/reviews`).send({ reviewers: ['caspar', 'ilse'] }).expect(201);
  });
  afterAll(async () => {
    await sut.close();
  });

  it('lists the version for each named reviewer, with its configuration, chip, author and who asked', async () => {
    const mine = await waiting(caspar);
    expect(mine).toEqual([
      expect.objectContaining({ configurationId, configurationName: 'Waiting notch', chipName: 'waiting chip', versionNumber: 1, versionStatus: 'in_review', author: 'noor', requestedBy: 'noor' }),
    ]);
    expect(Number.isNaN(Date.parse(mine[0]?.requestedAt ?? ''))).toBe(false);
    expect(await waiting(ilse)).toHaveLength(1);
  });

  it('lists nothing for the author and for a member nobody asked (a viewer may still read the route)', async () => {
    expect(await waiting(noor)).toEqual([]);
    expect(await waiting(dario)).toEqual([]);
  });

  it('drops a review once its reviewer decided, and keeps the other reviewer waiting', async () => {
    await caspar.post(`/api/teams/${teamId}/configurations/${configurationId}/versions/1/decision`).send({ decision: 'approve' }).expect(200);
    expect(await waiting(caspar)).toEqual([]);
    expect((await waiting(ilse)).map((w) => w.versionNumber)).toEqual([1]);
  });

  it('lists it again when the reviewer is asked again (the earlier decision is cleared)', async () => {
    await noor.post(`/api/teams/${teamId}/configurations/${configurationId}/versions/1/reviews`).send({ reviewers: ['caspar'] }).expect(201);
    expect((await waiting(caspar)).map((w) => w.configurationName)).toEqual(['Waiting notch']);
  });

  it("keeps to the team of the URL: another team of the same member lists nothing, and a non-member gets 403", async () => {
    const other = teamSchema.parse((await ilse.post('/api/teams').send({ name: 'Second Bench' }).expect(201)).body);
    expect(await waiting(ilse, other.id)).toEqual([]);
    await caspar.get(`/api/teams/${other.id}/reviews/waiting`).expect(403);
    await caspar.get('/api/teams/not-a-uuid/reviews/waiting').expect(400);
  });
});
