// Mail: invitations land in the outbox of the local fake transport; a failing SMTP server does not fail the request.
import type { INestApplication } from '@nestjs/common';
import { outboxMessageSchema } from '@hexloom/contracts';
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outboxMessages } from '../src/db/schema/index.js';
import { signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('mail through the outbox', () => {
  let sut: INestApplication;
  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });

  it('keeps an invitation e-mail in the team outbox, readable by owners only', async () => {
    const owner = (await signIn(sut, { login: 'ilse' })).agent;
    const designer = (await signIn(sut, { login: 'noor' })).agent;
    const teamId = await demoTeamId(sut);
    await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'new.colleague@kestrel-vale.example', role: 'designer' }).expect(201);
    const outbox = (await owner.get(`/api/teams/${teamId}/outbox`).expect(200)).body as unknown[];
    const message = outboxMessageSchema.parse(outbox[0]);
    expect(message).toMatchObject({ kind: 'invitation', to: 'new.colleague@kestrel-vale.example' });
    expect(message.subject).toMatch(/Ilse Marrow invited you to Kestrel Vale RF Photonics/);
    expect(message.text).toMatch(/as designer/);
    await designer.get(`/api/teams/${teamId}/outbox`).expect(403);
  });
});

describe('mail through SMTP', () => {
  let sut: INestApplication;
  beforeAll(async () => {
    // Port 1 on the loopback refuses connections: the SMTP send fails.
    sut = await startTestApp({ smtpUrl: 'smtp://127.0.0.1:1' });
  });
  afterAll(async () => {
    await sut.close();
  });

  it('still answers 201 when the SMTP server is down, and writes nothing to the outbox', async () => {
    const owner = (await signIn(sut, { login: 'ilse' })).agent;
    const teamId = await demoTeamId(sut);
    await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'smtp.case@kestrel-vale.example', role: 'viewer' }).expect(201);
    expect((await databaseOf(sut).select({ n: count() }).from(outboxMessages))[0]?.n).toBe(0);
  });
});
