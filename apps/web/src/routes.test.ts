// Route builders: same-site return paths only, encoded once.
import { describe, expect, it } from 'vitest';
import { loginUrl, safeReturnTo, signInPath, teamMembersPath } from './routes.js';

describe('routes', () => {
  it('keeps same-site paths and turns everything else into the root', () => {
    expect(safeReturnTo('/t/kestrel-vale/members?tab=1')).toBe('/t/kestrel-vale/members?tab=1');
    expect(safeReturnTo('//evil.example/x')).toBe('/');
    expect(safeReturnTo('https://evil.example/')).toBe('/');
    expect(safeReturnTo('/\\evil.example')).toBe('/');
    expect(safeReturnTo('/signin?returnTo=/x')).toBe('/');
    expect(safeReturnTo(null)).toBe('/');
  });

  it('builds the sign-in and login addresses with an encoded returnTo', () => {
    expect(signInPath('/')).toBe('/signin');
    expect(signInPath('/t/a b')).toBe('/signin?returnTo=%2Ft%2Fa%20b');
    expect(loginUrl('/t/kestrel-vale')).toBe('/api/auth/login?returnTo=%2Ft%2Fkestrel-vale');
    expect(teamMembersPath('kestrel-vale')).toBe('/t/kestrel-vale/members');
  });
});
