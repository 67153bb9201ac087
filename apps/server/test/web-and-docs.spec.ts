// The OpenAPI document covers every route, and the built web app is served with an SPA fallback.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp } from './support/test-app.js';

const ROUTES = [
  'get /api/health',
  'get /api/auth/providers',
  'get /api/auth/login',
  'get /api/auth/callback',
  'post /api/auth/logout',
  'get /api/me',
  'get /api/figures',
  'get /api/teams',
  'post /api/teams',
  'get /api/teams/{teamId}',
  'get /api/teams/{teamId}/members',
  'patch /api/teams/{teamId}/members/{userId}',
  'delete /api/teams/{teamId}/members/{userId}',
  'get /api/teams/{teamId}/invitations',
  'post /api/teams/{teamId}/invitations',
  'delete /api/teams/{teamId}/invitations/{invitationId}',
  'get /api/teams/{teamId}/audit',
  'get /api/local-idp/authorize',
  'post /api/local-idp/authorize',
  'post /api/local-idp/access_token',
  'get /api/local-idp/user',
  'get /api/teams/{teamId}/outbox',
  'get /api/teams/{teamId}/chips',
  'post /api/teams/{teamId}/chips',
  'post /api/teams/{teamId}/chips/import',
  'get /api/teams/{teamId}/chips/{chipId}',
  'patch /api/teams/{teamId}/chips/{chipId}',
  'get /api/teams/{teamId}/chips/{chipId}/export',
  'get /api/teams/{teamId}/chips/{chipId}/calibration',
  'put /api/teams/{teamId}/chips/{chipId}/calibration',
  'get /api/teams/{teamId}/chips/{chipId}/configurations',
  'post /api/teams/{teamId}/chips/{chipId}/configurations',
  'get /api/teams/{teamId}/configurations/{configurationId}',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions',
  'post /api/teams/{teamId}/configurations/{configurationId}/duplicate',
  'get /api/teams/{teamId}/configurations/{configurationId}/diff',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/reviews',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/reviews',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/decision',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/comments',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/comments',
  'patch /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/comments/{commentId}',
  'get /api/teams/{teamId}/reviews/waiting',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/simulate',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/mask-check',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/synthesise',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/circuits',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/circuits/{circuitId}/remove',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/circuits/{circuitId}/reroute',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/yield-jobs',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/yield-jobs/{jobId}',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/yield-jobs/{jobId}/events',
  'delete /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/yield-jobs/{jobId}',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/bench-export',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/touchstone',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/measurements',
  'post /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/measurements',
  'get /api/teams/{teamId}/configurations/{configurationId}/versions/{number}/measurements/{measurementId}/comparison',
];

describe('OpenAPI document and web app serving', () => {
  const webDistDir = mkdtempSync(join(tmpdir(), 'hexloom-web-'));
  let sut: INestApplication;

  beforeAll(async () => {
    mkdirSync(join(webDistDir, 'assets'));
    writeFileSync(join(webDistDir, 'index.html'), '<!doctype html><title>Hexloom</title><div id="root"></div>');
    writeFileSync(join(webDistDir, 'assets', 'app.js'), 'console.log("hexloom");');
    sut = await startTestApp({ webDistDir });
  });
  afterAll(async () => {
    await sut.close();
    rmSync(webDistDir, { recursive: true, force: true });
  });

  it('documents every route with a summary in /api/docs-json (OpenAPI 3)', async () => {
    const doc = (await request(sut.getHttpServer()).get('/api/docs-json').expect(200)).body as {
      openapi: string;
      paths: Record<string, Record<string, { summary?: string }>>;
    };
    expect(doc.openapi).toMatch(/^3\./);
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`));
    expect(documented.sort()).toEqual([...ROUTES].sort());
    for (const ops of Object.values(doc.paths)) for (const op of Object.values(ops)) expect(op.summary).toBeTruthy();
  });

  it('describes request bodies with the contract schemas', async () => {
    const doc = (await request(sut.getHttpServer()).get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: { required?: string[] } }> } }>>;
    };
    const body = doc.paths['/api/teams/{teamId}/invitations']?.['post']?.requestBody?.content['application/json']?.schema;
    expect(body?.required?.sort()).toEqual(['email', 'role']);
  });

  it('serves the docs UI page', async () => {
    const res = await request(sut.getHttpServer()).get('/api/docs').redirects(1).expect(200);
    expect(res.text).toMatch(/swagger-ui/);
  });

  it('serves static files and index.html for any other page, but 404 JSON under /api', async () => {
    const server = sut.getHttpServer();
    expect((await request(server).get('/assets/app.js').expect(200)).text).toContain('hexloom');
    for (const page of ['/', '/signin', '/t/kestrel-vale/members']) {
      const res = await request(server).get(page).expect(200);
      expect(res.text).toContain('<div id="root">');
    }
    const api = await request(server).get('/api/t/kestrel-vale').expect(404);
    expect(api.body).toMatchObject({ statusCode: 404 });
  });

  it('sets the security headers on every answer', async () => {
    const res = await request(sut.getHttpServer()).get('/api/health').expect(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
