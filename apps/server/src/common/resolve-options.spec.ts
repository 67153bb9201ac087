import { describe, expect, it } from 'vitest';
import { InvalidOptionsError, resolveOptions } from './resolve-options.js';

describe('resolveOptions', () => {
  it('defaults to localhost:3000, a random secret, the local provider and non-Secure cookies', () => {
    const a = resolveOptions({ dataDir: 'memory', seedDemo: false });
    const b = resolveOptions({ dataDir: 'memory', seedDemo: false });
    expect(a).toMatchObject({ publicUrl: 'http://localhost:3000', github: null, cookieSecure: false, webDistDir: null });
    expect(a.sessionSecret).toMatch(/^[0-9a-f]{64}$/);
    expect(a.sessionSecret).not.toBe(b.sessionSecret);
  });
  it('turns Secure cookies on for an https public URL and drops a trailing slash', () => {
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, publicUrl: 'https://hexloom.example/' })).toMatchObject({
      publicUrl: 'https://hexloom.example',
      cookieSecure: true,
    });
  });
  it('ignores GitHub credentials with an empty secret', () => {
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, github: { clientId: 'id', clientSecret: '' } }).github).toBeNull();
  });
  it('refuses a public URL with a path, naming it', () => {
    expect(() => resolveOptions({ dataDir: 'memory', seedDemo: false, publicUrl: 'http://h.example/app' })).toThrow(InvalidOptionsError);
    expect(() => resolveOptions({ dataDir: 'memory', seedDemo: false, publicUrl: 'http://h.example/app' })).toThrow(/"http:\/\/h.example\/app"/);
  });
});
