// Test helper: one signed-in agent per kind of caller, for the route x role matrices.
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { signIn, type Agent } from './sign-in.js';

/** Everyone a route can be called by: nobody, a member of another team, and each role of the demo team. */
export type Actor = 'anonymous' | 'outsider' | 'viewer' | 'reviewer' | 'designer' | 'owner';

/**
 * Signs in a demo account of every role, plus an outsider who owns a team of their own ("Elsewhere Optics").
 * Returns the agents and the id of the outsider's team.
 */
export async function signInActors(sut: INestApplication): Promise<{ agents: Record<Actor, Agent>; otherTeamId: string }> {
  const agents = {} as Record<Actor, Agent>;
  agents.anonymous = request.agent(sut.getHttpServer());
  agents.owner = (await signIn(sut, { login: 'ilse' })).agent;
  agents.designer = (await signIn(sut, { login: 'noor' })).agent;
  agents.reviewer = (await signIn(sut, { login: 'caspar' })).agent;
  agents.viewer = (await signIn(sut, { login: 'dario' })).agent;
  agents.outsider = (await signIn(sut, { login: 'zora', name: 'Zora Quill', email: 'zora@elsewhere.example' })).agent;
  const otherTeamId = (await agents.outsider.post('/api/teams').send({ name: 'Elsewhere Optics' }).expect(201)).body.id as string;
  return { agents, otherTeamId };
}
