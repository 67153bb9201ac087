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
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, publicUrl: 'https://hexloom.example/', localIdp: true })).toMatchObject({
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

describe('resolveOptions and the built-in local sign-in', () => {
  it('turns it on for a server only this machine reaches: loopback address and an http loopback URL', () => {
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false })).toMatchObject({ host: '127.0.0.1', localIdp: true });
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, host: '::1', publicUrl: 'http://127.0.0.1:3000' }).localIdp).toBe(true);
  });
  it('refuses to start it on an https public URL or on every interface, saying what to set', () => {
    expect(() => resolveOptions({ dataDir: 'memory', seedDemo: false, publicUrl: 'https://hexloom.example' })).toThrow(/no sign-in provider.*GITHUB_CLIENT_ID.*HEXLOOM_LOCAL_IDP=true/);
    expect(() => resolveOptions({ dataDir: 'memory', seedDemo: false, host: '0.0.0.0' })).toThrow(InvalidOptionsError);
    expect(() => resolveOptions({ dataDir: 'memory', seedDemo: false, localIdp: false })).toThrow(/turned off/);
  });
  it('starts it anywhere when asked explicitly, and never with code-host credentials', () => {
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, host: '0.0.0.0', publicUrl: 'https://h.example', localIdp: true }).localIdp).toBe(true);
    expect(resolveOptions({ dataDir: 'memory', seedDemo: false, host: '0.0.0.0', publicUrl: 'https://h.example', github: { clientId: 'id', clientSecret: 's' } }).localIdp).toBe(false);
  });
});
