// Inputs that used to answer 500: NUL characters, lone surrogates, integers past the database's column, and names with
// control characters; each is now a 400 naming the field, and nothing is written.
import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { type Agent, signIn } from './support/sign-in.js';
import { auditCount, demoTeamId, startTestApp } from './support/test-app.js';

describe('inputs that used to break the server', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  let chip: Chip;
  let base = '';

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(noor, teamId, 'holes chip', 2, 3);
    const created = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'holes' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${created.id}`;
  });
  afterAll(async () => {
    await sut.close();
  });

  it('refuses a NUL character in any text with a 400 naming the field, and writes nothing', async () => {
    const before = await auditCount(sut);
    const res = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'a\u0000b' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ path: 'name', message: 'contains a NUL character' }]);
    const deep = await noor.post(`${base}/versions/1/comments`).send({ body: 'fine', anchor: { gate: 'g(0,0)e\u0000' } });
    expect(deep.status).toBe(400);
    expect(deep.body.issues[0].path).toBe('anchor.gate');
    expect(await auditCount(sut)).toBe(before);
  });

  it('refuses a lone surrogate in a name with a 400', async () => {
    const res = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'notch \ud800' });
    expect(res.status).toBe(400);
    expect(res.body.issues[0]).toMatchObject({ path: 'name', message: expect.stringMatching(/lone UTF-16 surrogate/) });
  });

  it('refuses version numbers past 2^31 - 1 in paths, queries and bodies with a 400, not a 500', async () => {
    expect((await noor.get(`${base}/versions/2147483648`)).status).toBe(400);
    expect((await noor.get(`${base}/diff?from=1&to=99999999999`)).status).toBe(400);
    const v1 = (await noor.get(`${base}/versions/1`).expect(200)).body;
    expect((await noor.post(`${base}/versions`).send({ baseVersion: 2 ** 40, content: v1.content })).status).toBe(400);
    expect((await noor.get(`${base}/versions/2147483647`)).status).toBe(404);
  });

  it('refuses names with a newline or another control character, which could forge lines in exports', async () => {
    const res = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'notch\n# approval: approved' });
    expect(res.status).toBe(400);
    expect(res.body.issues[0]).toMatchObject({ path: 'name', message: expect.stringMatching(/one line without control characters/) });
    expect((await noor.patch(`/api/teams/${teamId}/chips/${chip.id}`).send({ name: 'chip\r\nx' })).status).toBe(400);
  });
});

describe('hard limits', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
  });
  afterAll(async () => {
    await sut.close();
  });

  it('refuses a chip larger than the server takes with a 422 naming the size', async () => {
    const small = (await createChip(noor, teamId, 'size source', 1, 1)).definition;
    const res = await noor.post(`/api/teams/${teamId}/chips`).send({ definition: { ...small, name: 'huge', shape: { kind: 'rectangle', rows: 100, columns: 100 } } });
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/10000 cells; the team server takes chips of at most 3600 cells/);
  });

  it('refuses a JSON body above 4 MiB with a 413', async () => {
    const res = await noor.post(`/api/teams/${teamId}/invitations`).set('content-type', 'application/json').send(JSON.stringify({ email: 'a@b.example', role: 'viewer', pad: 'x'.repeat(5 * 1024 * 1024) }));
    expect(res.status).toBe(413);
  });

  it('refuses JSON nested deeper than 64 levels with a 400', async () => {
    let deep: unknown = 'x';
    for (let i = 0; i < 100; i++) deep = { a: deep };
    const ilse = (await signIn(sut, { login: 'ilse' })).agent;
    const res = await ilse.post(`/api/teams/${teamId}/invitations`).send({ email: 'deep@b.example', role: 'viewer', extra: deep });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].message).toMatch(/nested deeper than 64 levels/);
  });
});
