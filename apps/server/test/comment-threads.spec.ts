// Comment threads on a version: @mentions of team members (listed and mailed), replies, resolve and reopen.
import type { INestApplication } from '@nestjs/common';
import { apiErrorSchema, commentSchema, type Comment } from '@hexloom/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comments } from '../src/db/schema/index.js';
import { createChip } from './support/demo-chip.js';
import { type Agent, signIn } from './support/sign-in.js';
import { auditCount, databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('comment threads', () => {
  let sut: INestApplication;
  let noor: Agent;
  let caspar: Agent;
  let dario: Agent;
  let ilse: Agent;
  let teamId = '';
  let base = '';
  let thread: Comment;
  let reply: Comment;

  const outbox = async (): Promise<{ kind: string; to: string; subject: string }[]> =>
    (await ilse.get(`/api/teams/${teamId}/outbox`).expect(200)).body as { kind: string; to: string; subject: string }[];
  const resolvedAtInDb = async (id: string): Promise<Date | null | undefined> =>
    (await databaseOf(sut).select({ at: comments.resolvedAt }).from(comments).where(eq(comments.id, id)))[0]?.at;

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    caspar = (await signIn(sut, { login: 'caspar' })).agent;
    dario = (await signIn(sut, { login: 'dario' })).agent;
    ilse = (await signIn(sut, { login: 'ilse' })).agent;
    teamId = await demoTeamId(sut);
    const chip = await createChip(noor, teamId, 'thread chip', 2, 3);
    const created = await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'threads' }).expect(201);
    base = `/api/teams/${teamId}/configurations/${created.body.id as string}/versions/1`;
  });
  afterAll(async () => {
    await sut.close();
  });

  it('lists as mentions only the @logins of team members, and mails only them (never the writer)', async () => {
    const before = (await outbox()).length;
    const res = await noor.post(`${base}/comments`).send({ body: '@caspar and @wen: is the bus loss fine? (cc @noor, @nobody, @zora)' }).expect(201);
    thread = commentSchema.parse(res.body);
    expect(thread.mentions).toEqual(['caspar', 'wen', 'noor']);
    expect(thread).toMatchObject({ resolvedAt: null, resolvedBy: null, parentId: null, author: 'noor' });
    const all = await outbox();
    const mails = all.slice(0, all.length - before);
    expect(mails.filter((m) => m.kind === 'mention').map((m) => m.to).sort()).toEqual(['caspar@kestrel-vale.example', 'wen@kestrel-vale.example']);
  });

  it('threads a reply under its parent and lists both with their mentions', async () => {
    reply = commentSchema.parse((await caspar.post(`${base}/comments`).send({ body: 'Fine by me, @noor.', parentId: thread.id }).expect(201)).body);
    expect(reply).toMatchObject({ parentId: thread.id, mentions: ['noor'] });
    const listed = (await dario.get(`${base}/comments`).expect(200)).body as unknown[];
    expect(listed.map((c) => commentSchema.parse(c)).map((c) => [c.id, c.parentId, c.mentions])).toEqual([
      [thread.id, null, ['caspar', 'wen', 'noor']],
      [reply.id, thread.id, ['noor']],
    ]);
  });

  it('lets a reviewer resolve a thread and a designer reopen it, each in the audit log', async () => {
    const before = await auditCount(sut);
    const resolved = commentSchema.parse((await caspar.patch(`${base}/comments/${thread.id}`).send({ resolved: true }).expect(200)).body);
    expect(resolved.resolvedBy).toBe('caspar');
    expect(Number.isNaN(Date.parse(resolved.resolvedAt ?? ''))).toBe(false);
    expect(((await dario.get(`${base}/comments`).expect(200)).body as Comment[])[0]?.resolvedBy).toBe('caspar');
    const reopened = commentSchema.parse((await noor.patch(`${base}/comments/${thread.id}`).send({ resolved: false }).expect(200)).body);
    expect(reopened).toMatchObject({ resolvedAt: null, resolvedBy: null });
    expect(await auditCount(sut)).toBe(before + 2);
  });

  it('refuses a viewer with 403 and leaves the thread open', async () => {
    const res = await dario.patch(`${base}/comments/${thread.id}`).send({ resolved: true }).expect(403);
    expect(apiErrorSchema.parse(res.body).statusCode).toBe(403);
    expect(await resolvedAtInDb(thread.id)).toBeNull();
  });

  it('answers 400 for a bad body and names the field', async () => {
    for (const bad of [{}, { resolved: 'yes' }, { resolved: true, body: 'edit' }]) {
      const res = await caspar.patch(`${base}/comments/${thread.id}`).send(bad);
      expect({ bad, status: res.status }).toEqual({ bad, status: 400 });
      expect(apiErrorSchema.parse(res.body).message).toBeTruthy();
    }
    expect(await resolvedAtInDb(thread.id)).toBeNull();
  });

  it('answers 422 for a reply and 404 for a comment that is not on this version', async () => {
    const onReply = await caspar.patch(`${base}/comments/${reply.id}`).send({ resolved: true }).expect(422);
    expect(apiErrorSchema.parse(onReply.body).message).toMatch(/reply/);
    expect(await resolvedAtInDb(reply.id)).toBeNull();
    await caspar.patch(`${base}/comments/00000000-0000-4000-8000-000000000000`).send({ resolved: true }).expect(404);
    await caspar.patch(`${base}/comments/not-a-uuid`).send({ resolved: true }).expect(400);
  });
});
