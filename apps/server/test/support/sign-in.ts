// Test helper: walks the real local-provider sign-in flow with a supertest agent.
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

/** A supertest agent keeping its cookies between requests. */
export type Agent = ReturnType<typeof request.agent>;

/** The account to pick on the authorize page (demo login, or any typed account). */
export type AccountChoice = { login: string; name?: string; email?: string };

/** A path plus query of an absolute or relative URL, for supertest. */
export function pathOf(url: string): string {
  const parsed = new URL(url, 'http://placeholder.invalid');
  return parsed.pathname + parsed.search;
}

/** Reads the hidden OAuth fields of the authorize page's first form. */
export function hiddenFields(html: string): Record<'client_id' | 'redirect_uri' | 'state', string> {
  const read = (name: string): string => {
    const match = new RegExp(`<input type="hidden" name="${name}" value="([^"]*)">`).exec(html);
    if (!match?.[1]) throw new Error(`hiddenFields: no hidden "${name}" field on the authorize page`);
    return match[1].replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');
  };
  return { client_id: read('client_id'), redirect_uri: read('redirect_uri'), state: read('state') };
}

/**
 * Runs login -> authorize page -> POST authorize, stopping before the callback.
 * Returns the callback path (with code and state) the provider redirected to.
 */
export async function startSignIn(agent: Agent, choice: AccountChoice, returnTo = '/', invitation?: string): Promise<string> {
  const login = await agent.get('/api/auth/login').query({ returnTo, ...(invitation ? { invitation } : {}) }).expect(302);
  const page = await agent.get(pathOf(String(login.headers['location']))).expect(200);
  const fields = hiddenFields(page.text);
  const posted = await agent
    .post('/api/local-idp/authorize')
    .type('form')
    .send({ ...fields, login: choice.login, name: choice.name ?? '', email: choice.email ?? '' })
    .expect(302);
  return pathOf(String(posted.headers['location']));
}

/** Signs `choice` in through the whole flow; returns the signed-in agent and where the callback sent it. */
export async function signIn(app: INestApplication, choice: AccountChoice, returnTo = '/', invitation?: string): Promise<{ agent: Agent; landedOn: string }> {
  const agent = request.agent(app.getHttpServer());
  const callback = await startSignIn(agent, choice, returnTo, invitation);
  const done = await agent.get(callback).expect(302);
  return { agent, landedOn: String(done.headers['location']) };
}
