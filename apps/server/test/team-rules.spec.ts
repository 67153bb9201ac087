// Business rules of teams: last-owner protection, invitations and their acceptance on sign-in, slugs, audit.
import type { INestApplication } from '@nestjs/common';
import { invitationSchema, meSchema, memberSchema, teamSchema } from '@hexloom/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { invitations } from '../src/db/schema/index.js';
import { type Agent, signIn } from './support/sign-in.js';
import { auditCount, databaseOf, demoTeamId, startTestApp, userIdOf } from './support/test-app.js';

describe('team rules', () => {
  let sut: INestApplication;
  let ilse: Agent;
  let teamId = '';

  beforeAll(async () => {
    sut = await startTestApp();
    ilse = (await signIn(sut, { login: 'ilse' })).agent;
    teamId = await demoTeamId(sut);
  });
  afterAll(async () => {
    await sut.close();
  });

  describe('last owner', () => {
    it('refuses to demote or remove the only owner of a team with 409 and changes nothing', async () => {
      const { agent: solo } = await signIn(sut, { login: 'sola', email: 'sola@lone.example' });
      const team = teamSchema.parse((await solo.post('/api/teams').send({ name: 'Lone Bench' }).expect(201)).body);
      const soloId = await userIdOf(sut, 'sola');
      const before = await auditCount(sut);
      const demote = await solo.patch(`/api/teams/${team.id}/members/${soloId}`).send({ role: 'viewer' }).expect(409);
      expect(demote.body).toMatchObject({ statusCode: 409, error: 'Conflict', message: expect.stringMatching(/last owner/) });
      await solo.delete(`/api/teams/${team.id}/members/${soloId}`).expect(409);
      const members = z.array(memberSchema).parse((await solo.get(`/api/teams/${team.id}/members`).expect(200)).body);
      expect(members).toEqual([expect.objectContaining({ login: 'sola', role: 'owner' })]);
      expect(await auditCount(sut)).toBe(before);
    });

    it('lets one of two owners step down, then protects the remaining one', async () => {
      const { agent: oskar } = await signIn(sut, { login: 'oskar' });
      const oskarId = await userIdOf(sut, 'oskar');
      const ilseId = await userIdOf(sut, 'ilse');
      const changed = memberSchema.parse((await oskar.patch(`/api/teams/${teamId}/members/${oskarId}`).send({ role: 'designer' }).expect(200)).body);
      expect(changed).toMatchObject({ login: 'oskar', role: 'designer' });
      await ilse.patch(`/api/teams/${teamId}/members/${ilseId}`).send({ role: 'reviewer' }).expect(409);
      await ilse.delete(`/api/teams/${teamId}/members/${ilseId}`).expect(409);
      await oskar.get(`/api/teams/${teamId}/invitations`).expect(403);
      await ilse.patch(`/api/teams/${teamId}/members/${oskarId}`).send({ role: 'owner' }).expect(200);
    });
  });

  describe('invitations', () => {
    it('refuses to invite the e-mail of a member with 409', async () => {
      const res = await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: 'NOOR@kestrel-vale.example', role: 'viewer' }).expect(409);
      expect(res.body.issues).toEqual([{ path: 'email', message: 'already a member' }]);
    });

    it('refuses a second pending invitation for the same address, whatever its case, with 409', async () => {
      await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: 'ravi@lab.example', role: 'viewer' }).expect(201);
      const before = await auditCount(sut);
      await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: ' Ravi@LAB.example ', role: 'owner' }).expect(409);
      expect(await databaseOf(sut).select().from(invitations).where(eq(invitations.email, 'ravi@lab.example'))).toHaveLength(1);
      expect(await auditCount(sut)).toBe(before);
    });

    it('adds the invitee to the team with the invited role when they sign in through the link of the invitation mail', async () => {
      const created = invitationSchema.parse(
        (await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: 'Pia@Studio.example', role: 'reviewer' }).expect(201)).body,
      );
      expect(created).toMatchObject({ email: 'pia@studio.example', role: 'reviewer', invitedBy: 'ilse', acceptedAt: null });
      // Typing the invited address on the local sign-in is not enough: anyone could type it.
      const { agent: impostor } = await signIn(sut, { login: 'not-pia', email: 'pia@studio.example' });
      expect(meSchema.parse((await impostor.get('/api/me').expect(200)).body).teams).toEqual([]);
      const mails = (await ilse.get(`/api/teams/${teamId}/outbox`).expect(200)).body as { to: string[]; text: string }[];
      const link = mails.find((m) => m.to.includes('pia@studio.example'))?.text.match(/\/api\/auth\/login\?invitation=([A-Za-z0-9_-]+)/)?.[1];
      expect(link).toBeDefined();
      const { agent: pia } = await signIn(sut, { login: 'pia', name: 'Pia Lund', email: 'pia@studio.example' }, '/', link);
      const me = meSchema.parse((await pia.get('/api/me').expect(200)).body);
      expect(me.teams).toEqual([expect.objectContaining({ id: teamId, slug: 'kestrel-vale', role: 'reviewer' })]);
      const listed = z.array(invitationSchema).parse((await ilse.get(`/api/teams/${teamId}/invitations`).expect(200)).body);
      expect(listed.find((i) => i.id === created.id)?.acceptedAt).not.toBeNull();
      await ilse.delete(`/api/teams/${teamId}/invitations/${created.id}`).expect(409);
      const audit = (await ilse.get(`/api/teams/${teamId}/audit?limit=1`).expect(200)).body as { action: string; actor: string }[];
      expect(audit).toEqual([expect.objectContaining({ action: 'invitation.accepted', actor: 'pia' })]);
    });

    it('does not add someone signing in with a different e-mail', async () => {
      await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: 'quin@lab.example', role: 'viewer' }).expect(201);
      const { agent } = await signIn(sut, { login: 'quin', email: 'quin@other.example' });
      expect(meSchema.parse((await agent.get('/api/me').expect(200)).body).teams).toEqual([]);
    });
  });

  describe('teams', () => {
    it('derives a free slug from the name and makes the creator the only owner', async () => {
      const first = teamSchema.parse((await ilse.post('/api/teams').send({ name: 'Delay Line Lab' }).expect(201)).body);
      const second = teamSchema.parse((await ilse.post('/api/teams').send({ name: 'Delay-Line LAB!' }).expect(201)).body);
      expect([first.slug, second.slug]).toEqual(['delay-line-lab', 'delay-line-lab-2']);
      const members = z.array(memberSchema).parse((await ilse.get(`/api/teams/${first.id}/members`).expect(200)).body);
      expect(members.map((m) => [m.login, m.role])).toEqual([['ilse', 'owner']]);
    });

    it('refuses a taken slug with 409 naming the slug', async () => {
      const res = await ilse.post('/api/teams').send({ name: 'Copycat', slug: 'kestrel-vale' }).expect(409);
      expect(res.body).toMatchObject({ message: expect.stringContaining('kestrel-vale'), issues: [{ path: 'slug', message: 'already taken' }] });
    });

    it('lists the audit log newest first and honours the limit', async () => {
      const res = await ilse.get(`/api/teams/${teamId}/audit?limit=3`).expect(200);
      const events = res.body as { at: string }[];
      expect(events).toHaveLength(3);
      const times = events.map((e) => Date.parse(e.at));
      expect([...times].sort((a, b) => b - a)).toEqual(times);
    });
  });
});
