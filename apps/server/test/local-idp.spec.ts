// The fake identity provider's HTTP endpoints, and the provider choice when GitHub credentials exist.
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hiddenFields, pathOf } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

const CALLBACK = 'http://localhost:3000/api/auth/callback';
const authorizeQuery = { client_id: 'hexloom-local', redirect_uri: CALLBACK, state: 'st-1' };

describe('the local identity provider', () => {
  let sut: INestApplication;

  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });

  const codeFor = async (login: string, extra: Record<string, string> = {}): Promise<string> => {
    const res = await request(sut.getHttpServer())
      .post('/api/local-idp/authorize')
      .type('form')
      .send({ ...authorizeQuery, login, ...extra })
      .expect(302);
    const location = new URL(String(res.headers['location']));
    expect(location.origin + location.pathname).toBe(CALLBACK);
    expect(location.searchParams.get('state')).toBe('st-1');
    return location.searchParams.get('code') ?? '';
  };

  it('answers providers with local when no GitHub credentials are configured', async () => {
    await request(sut.getHttpServer()).get('/api/auth/providers').expect(200, { provider: 'local' });
  });

  it('renders the authorize page with its title, note, one button per demo account and a form for others', async () => {
    const res = await request(sut.getHttpServer()).get('/api/local-idp/authorize').query(authorizeQuery).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.text).toContain('<title>Hexloom local sign-in</title>');
    expect(res.text).toMatch(/stands in for the code host's sign-in/);
    for (const login of ['ilse', 'oskar', 'noor', 'tobin', 'caspar', 'wen', 'dario', 'maelle']) {
      expect(res.text).toContain(`data-testid="account-${login}"`);
    }
    expect(res.text).toMatch(/<input id="login" name="login"/);
    expect(res.text).toMatch(/<input id="email" name="email" type="email"/);
    expect(hiddenFields(res.text)).toEqual(authorizeQuery);
  });

  it('escapes what it renders, so a hostile state cannot inject markup', async () => {
    const state = '"><script>alert(1)</script>';
    const res = await request(sut.getHttpServer()).get('/api/local-idp/authorize').query({ ...authorizeQuery, state }).expect(200);
    expect(res.text).not.toContain('<script>');
    expect(res.text).toContain('value="&quot;&gt;&lt;script&gt;alert(1)&lt;/script&gt;"');
  });

  it('sends a CSP that allows the page inline style but no inline script', async () => {
    const res = await request(sut.getHttpServer()).get('/api/local-idp/authorize').query(authorizeQuery).expect(200);
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toMatch(/style-src 'self' 'unsafe-inline'/);
    expect(csp).toMatch(/script-src 'self'(;|$)/);
  });

  it('refuses an unknown client or a foreign redirect_uri with 400', async () => {
    const server = sut.getHttpServer();
    const badClient = await request(server).get('/api/local-idp/authorize').query({ ...authorizeQuery, client_id: 'other' }).expect(400);
    expect(badClient.body.issues).toEqual([expect.objectContaining({ path: 'client_id' })]);
    const badRedirect = await request(server)
      .get('/api/local-idp/authorize')
      .query({ ...authorizeQuery, redirect_uri: 'https://evil.example/cb' })
      .expect(400);
    expect(badRedirect.body.issues).toEqual([expect.objectContaining({ path: 'redirect_uri' })]);
  });

  it('exchanges a code once for a bearer token whose user endpoint names the demo account', async () => {
    const code = await codeFor('noor');
    const token = await request(sut.getHttpServer())
      .post('/api/local-idp/access_token')
      .send({ client_id: 'hexloom-local', code, redirect_uri: CALLBACK })
      .expect(200);
    expect(token.body).toMatchObject({ token_type: 'bearer', access_token: expect.any(String) });
    const user = await request(sut.getHttpServer())
      .get('/api/local-idp/user')
      .set('Authorization', `Bearer ${token.body.access_token}`)
      .expect(200);
    expect(user.body).toEqual({ id: 'local:noor', login: 'noor', name: 'Noor Halvorsen', email: 'noor@kestrel-vale.example', avatar_url: null });
    const again = await request(sut.getHttpServer()).post('/api/local-idp/access_token').send({ client_id: 'hexloom-local', code }).expect(400);
    expect(again.body.issues).toEqual([{ path: 'code', message: 'used' }]);
  });

  it('accepts the token exchange as a form post too, and keeps a typed account as typed', async () => {
    const code = await codeFor('Pia-Lund', { name: 'Pia Lund', email: 'PIA@Studio.Example' });
    const token = await request(sut.getHttpServer())
      .post('/api/local-idp/access_token')
      .type('form')
      .send({ client_id: 'hexloom-local', code })
      .expect(200);
    const user = await request(sut.getHttpServer()).get('/api/local-idp/user').set('Authorization', `Bearer ${token.body.access_token}`).expect(200);
    expect(user.body).toEqual({ id: 'local:pia-lund', login: 'pia-lund', name: 'Pia Lund', email: 'pia@studio.example', avatar_url: null });
  });

  it('refuses a code issued for another client with 400', async () => {
    const code = await codeFor('wen');
    const res = await request(sut.getHttpServer()).post('/api/local-idp/access_token').send({ client_id: 'someone-else', code }).expect(400);
    expect(res.body.issues).toEqual([{ path: 'code', message: 'wrong-client' }]);
  });

  it('answers the user endpoint with 401 without or with an unknown bearer token', async () => {
    await request(sut.getHttpServer()).get('/api/local-idp/user').expect(401);
    await request(sut.getHttpServer()).get('/api/local-idp/user').set('Authorization', 'Bearer nope').expect(401);
  });
});

describe('with GitHub credentials configured', () => {
  let sut: INestApplication;

  beforeAll(async () => {
    sut = await startTestApp({ github: { clientId: 'Iv1.test-client', clientSecret: 'test-secret' }, publicUrl: 'https://hexloom.example' });
  });
  afterAll(async () => {
    await sut.close();
  });

  it('answers providers with github and sends login to the code host authorize URL with a state', async () => {
    await request(sut.getHttpServer()).get('/api/auth/providers').expect(200, { provider: 'github' });
    const res = await request(sut.getHttpServer()).get('/api/auth/login').expect(302);
    // The code host's documented OAuth web flow endpoint and parameters (from memory).
    const location = new URL(String(res.headers['location']));
    expect(location.origin + location.pathname).toBe('https://github.com/login/oauth/authorize');
    expect(location.searchParams.get('client_id')).toBe('Iv1.test-client');
    expect(location.searchParams.get('redirect_uri')).toBe('https://hexloom.example/api/auth/callback');
    expect(location.searchParams.get('state')).toMatch(/^[A-Za-z0-9_-]{32}$/);
  });

  it('marks the cookies Secure when the public URL is https', async () => {
    const res = await request(sut.getHttpServer()).get('/api/auth/login').expect(302);
    const cookies = res.headers['set-cookie'] as unknown as string[];
    expect(cookies.find((c) => c.startsWith('hexloom_oauth_state='))).toMatch(/; Secure/);
  });

  it('does not serve the local identity provider', async () => {
    await request(sut.getHttpServer()).get(pathOf('/api/local-idp/authorize?client_id=x')).expect(404);
  });
});
