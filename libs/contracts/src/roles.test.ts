import { describe, expect, it } from 'vitest';
import { createInvitationSchema, createTeamSchema, TEAM_ROLES, teamRoleSchema } from './index.js';

describe('contracts', () => {
  it('lists the four team roles, owner first', () => {
    expect(TEAM_ROLES).toEqual(['owner', 'designer', 'reviewer', 'viewer']);
    expect(teamRoleSchema.safeParse('admin').success).toBe(false);
  });
  it('normalises an invitation e-mail address and rejects a malformed one', () => {
    expect(createInvitationSchema.parse({ email: ' Ana@Example.ORG ', role: 'viewer' }).email).toBe('ana@example.org');
    const bad = createInvitationSchema.safeParse({ email: 'not-an-address', role: 'viewer' });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(['email']);
  });
  it('rejects a team slug with upper-case letters', () => {
    expect(createTeamSchema.safeParse({ name: 'Ok team', slug: 'Bad' }).success).toBe(false);
  });
});
