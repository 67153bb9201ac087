// The sign-in flow through the local identity provider: state, codes, cookies, sessions.
import { createHash } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import { meSchema } from '@hexloom/contracts';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { auditEvents, sessions } from '../src/db/schema/index.js';
import { pathOf, signIn, startSignIn } from './support/sign-in.js';
import { auditCount, databaseOf, startTestApp } from './support/test-app.js';

const setCookies = (res: request.Response): string[] => {
  const raw = res.headers['set-cookie'] as unknown;
  return Array.isArray(raw) ? (raw as string[]) : typeof raw === 'string' ? [raw] : [];
};

describe('sign-in through the local identity provider', () => {
  let sut: INestApplication;

  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('signs a demo account in, lands on returnTo and answers /api/me with its team and role', async () => {
    const { agent, landedOn } = await signIn(sut, { login: 'ilse' }, '/t/kestrel-vale/members');
    expect(landedOn).toBe('/t/kestrel-vale/members');
    const me = meSchema.parse((await agent.get('/api/me').expect(200)).body);
    expect(me.user).toMatchObject({ login: 'ilse', name: 'Ilse Marrow', email: 'ilse@kestrel-vale.example' });
    expect(me.teams).toEqual([expect.objectContaining({ slug: 'kestrel-vale', role: 'owner' })]);
  });

  it('redirects to / when no returnTo was given', async () => {
    const { landedOn } = await signIn(sut, { login: 'noor' });
    expect(landedOn).toBe('/');
  });

  it('sets a signed, HttpOnly, SameSite=Lax session cookie and stores only the sha-256 of its token', async () => {
    const agent = request.agent(sut.getHttpServer());
    const callback = await startSignIn(agent, { login: 'caspar' });
    const res = await agent.get(callback).expect(302);
    const cookie = setCookies(res).find((c) => c.startsWith('hexloom_session='));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/; HttpOnly/);
    expect(cookie).toMatch(/; SameSite=Lax/);
    expect(cookie).not.toMatch(/; Secure/);
    // cookie-parser signed cookies are "s:<value>.<signature>" (common practice of cookie-signature).
    const value = decodeURIComponent(/^hexloom_session=([^;]*)/.exec(cookie ?? '')?.[1] ?? '');
    expect(value.startsWith('s:')).toBe(true);
    const token = value.slice(2, value.lastIndexOf('.'));
    expect(Buffer.from(token, 'base64url')).toHaveLength(32);
    const db = databaseOf(sut);
    const digest = createHash('sha256').update(token).digest('hex');
    expect(await db.select().from(sessions).where(eq(sessions.id, digest))).toHaveLength(1);
    expect(await db.select().from(sessions).where(eq(sessions.id, token))).toHaveLength(0);
  });

  it('refuses a tampered session cookie with 401', async () => {
    await request(sut.getHttpServer()).get('/api/me').set('Cookie', 'hexloom_session=s%3Aforged.bad-signature').expect(401);
  });

  it('answers 400 when the state does not match the signed state cookie, and signs nobody in', async () => {
    const agent = request.agent(sut.getHttpServer());
    const callback = new URL(await startSignIn(agent, { login: 'dario' }), 'http://x.invalid');
    callback.searchParams.set('state', 'forged-state');
    const before = await auditCount(sut);
    const res = await agent.get(callback.pathname + callback.search).expect(400);
    expect(res.body).toMatchObject({ statusCode: 400, issues: [{ path: 'state', message: 'mismatch' }] });
    expect(setCookies(res).some((c) => c.startsWith('hexloom_session=s'))).toBe(false);
    expect(await auditCount(sut)).toBe(before);
    await agent.get('/api/me').expect(401);
  });

  it('answers 400 when the callback arrives without the state cookie (another browser)', async () => {
    const callback = await startSignIn(request.agent(sut.getHttpServer()), { login: 'dario' });
    const res = await request(sut.getHttpServer()).get(callback).expect(400);
    expect(res.body.issues).toEqual([{ path: 'state', message: 'missing-cookie' }]);
  });

  it('refuses a code used twice with 400', async () => {
    const agent = request.agent(sut.getHttpServer());
    const first = await startSignIn(agent, { login: 'wen' });
    await agent.get(first).expect(302);
    const usedCode = new URL(first, 'http://x.invalid').searchParams.get('code') ?? '';
    // A fresh login gives a valid state cookie, so only the code is at fault.
    const second = new URL(await startSignIn(agent, { login: 'wen' }), 'http://x.invalid');
    second.searchParams.set('code', usedCode);
    const res = await agent.get(second.pathname + second.search).expect(400);
    expect(res.body).toMatchObject({ statusCode: 400, issues: [{ path: 'code', message: 'used' }] });
  });

  it('refuses a code older than ten minutes with 400', async () => {
    vi.useFakeTimers({ toFake: ['Date'], now: new Date('2031-03-01T09:00:00Z') });
    const agent = request.agent(sut.getHttpServer());
    const callback = await startSignIn(agent, { login: 'tobin' });
    vi.setSystemTime(new Date('2031-03-01T09:10:01Z'));
    const res = await agent.get(callback).expect(400);
    expect(res.body.issues).toEqual([{ path: 'code', message: 'expired' }]);
  });

  it('expires sessions after 30 days even when the browser still sends the cookie', async () => {
    vi.useFakeTimers({ toFake: ['Date'], now: new Date('2031-04-01T09:00:00Z') });
    const agent = request.agent(sut.getHttpServer());
    const res = await agent.get(await startSignIn(agent, { login: 'maelle' })).expect(302);
    const pair = setCookies(res).find((c) => c.startsWith('hexloom_session='))?.split(';')[0] ?? '';
    vi.setSystemTime(new Date('2031-04-30T08:59:00Z'));
    await request(sut.getHttpServer()).get('/api/me').set('Cookie', pair).expect(200);
    vi.setSystemTime(new Date('2031-05-01T09:00:01Z'));
    await request(sut.getHttpServer()).get('/api/me').set('Cookie', pair).expect(401);
  });

  it('signs out: 204, the session row is deleted, the cookie cleared, /api/me then 401, and the event audited', async () => {
    const { agent } = await signIn(sut, { login: 'oskar' });
    const before = await databaseOf(sut).select().from(sessions);
    const res = await agent.post('/api/auth/logout').expect(204);
    expect(setCookies(res).some((c) => /^hexloom_session=;/.test(c))).toBe(true);
    expect(await databaseOf(sut).select().from(sessions)).toHaveLength(before.length - 1);
    await agent.get('/api/me').expect(401);
    const signOuts = await databaseOf(sut).select().from(auditEvents).where(eq(auditEvents.action, 'auth.signed_out'));
    expect(signOuts).toHaveLength(1);
  });

  it('answers sign-out without a session with 204 and records nothing', async () => {
    const before = await auditCount(sut);
    await request(sut.getHttpServer()).post('/api/auth/logout').expect(204);
    expect(await auditCount(sut)).toBe(before);
  });

  it('audits each successful sign-in with the user as actor and target', async () => {
    const rows = await databaseOf(sut).select().from(auditEvents).where(eq(auditEvents.action, 'auth.signed_in'));
    expect(rows.length).toBeGreaterThanOrEqual(5);
    expect(rows.every((r) => r.teamId === null && r.actorId !== null && r.target !== null)).toBe(true);
  });

  it('rejects a returnTo that leaves the site with 400', async () => {
    const res = await request(sut.getHttpServer()).get('/api/auth/login').query({ returnTo: '//evil.example/x' }).expect(400);
    expect(res.body.issues).toEqual([expect.objectContaining({ path: 'returnTo' })]);
  });

  it('sets a short-lived, signed, HttpOnly state cookie on login', async () => {
    const res = await request(sut.getHttpServer()).get('/api/auth/login').expect(302);
    const cookie = setCookies(res).find((c) => c.startsWith('hexloom_oauth_state='));
    expect(cookie).toMatch(/Max-Age=900/);
    expect(cookie).toMatch(/; HttpOnly/);
    expect(cookie).toMatch(/; SameSite=Lax/);
    expect(decodeURIComponent(cookie ?? '')).toMatch(/^hexloom_oauth_state=s:j:/);
    expect(pathOf(String(res.headers['location']))).toMatch(/^\/api\/local-idp\/authorize\?client_id=hexloom-local&/);
  });
});
