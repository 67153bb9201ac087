// The route x role matrices stay complete: every route the OpenAPI document lists is walked by one of them.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp } from './support/test-app.js';

const here = fileURLToPath(new URL('.', import.meta.url));
const VERSION = '/api/teams/{teamId}/configurations/{configurationId}/versions/{number}';

/** Routes the matrices leave out on purpose, with why (each is covered by its own flow test). */
const NOT_IN_MATRIX: Record<string, string> = {
  'post /api/auth/logout': 'answers 204 to anyone, signed in or not (auth flow tests)',
  'post /api/local-idp/authorize': 'the local sign-in form itself (local-idp.spec.ts)',
  'post /api/local-idp/access_token': 'the code exchange of the local sign-in (local-idp.spec.ts)',
};

/** `GET .../yield-jobs/:jobId (note)` -> `get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/yield-jobs/{jobId}`. */
function normalise(route: string): string {
  const [method, raw] = route.replace(/\s*\(.*\)\s*$/, '').split(' ') as [string, string];
  let path = raw.replace(/^\.\.\./, VERSION).replace(/^\/configurations\/:id\/versions\/:number/, VERSION).replace(/^\/configurations\/:id/, '/api/teams/{teamId}/configurations/{configurationId}');
  if (!path.startsWith('/api/')) path = `/api/teams/{teamId}${path}`;
  path = path.replace(/\/measurements\/:id\//, '/measurements/{measurementId}/').replace(/:([A-Za-z]+)/g, '{$1}');
  return `${method.toLowerCase()} ${path}`;
}

describe('the route x role matrices', () => {
  let sut: INestApplication;
  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });

  it('walk every documented route, so a new route without its role checks fails here', async () => {
    const doc = (await request(sut.getHttpServer()).get('/api/docs-json').expect(200)).body as { paths: Record<string, Record<string, unknown>> };
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`));
    const text = ['team-server-route-matrix.spec.ts', 'route-matrix.spec.ts'].map((f) => readFileSync(`${here}${f}`, 'utf8')).join('\n');
    const walked = new Set([...text.matchAll(/route: '([A-Z]+ [^']+)'/g)].map((m) => normalise(m[1] as string)));
    const missing = documented.filter((r) => !walked.has(r) && !(r in NOT_IN_MATRIX));
    expect(missing).toEqual([]);
    expect(walked.size).toBeGreaterThan(50);
  });
});
