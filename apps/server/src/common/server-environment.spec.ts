import { describe, expect, it } from 'vitest';
import { EnvironmentError, readServerEnvironment } from './server-environment.js';

describe('readServerEnvironment', () => {
  it('listens on 127.0.0.1 unless HOST says otherwise', () => {
    expect(readServerEnvironment({})).toMatchObject({ port: 3000, host: '127.0.0.1', options: { host: '127.0.0.1', publicUrl: 'http://localhost:3000' } });
    expect(readServerEnvironment({ HOST: '0.0.0.0', PORT: '8080' })).toMatchObject({ port: 8080, host: '0.0.0.0' });
  });
  it('passes HEXLOOM_LOCAL_IDP through only when set, and refuses a flag that is not true or false', () => {
    expect(readServerEnvironment({}).options.localIdp).toBeUndefined();
    expect(readServerEnvironment({ HEXLOOM_LOCAL_IDP: 'true' }).options.localIdp).toBe(true);
    expect(() => readServerEnvironment({ HEXLOOM_LOCAL_IDP: 'yes' })).toThrow(EnvironmentError);
    expect(() => readServerEnvironment({ HEXLOOM_LOCAL_IDP: 'yes' })).toThrow(/HEXLOOM_LOCAL_IDP/);
    expect(() => readServerEnvironment({ PORT: '70000' })).toThrow(/PORT "70000"/);
  });
  it('passes HEXLOOM_QUEUE_WORKER through only when set', () => {
    expect(readServerEnvironment({}).options.queueWorker).toBeUndefined();
    expect(readServerEnvironment({ HEXLOOM_QUEUE_WORKER: 'false' }).options.queueWorker).toBe(false);
    expect(() => readServerEnvironment({ HEXLOOM_QUEUE_WORKER: '0' })).toThrow(/HEXLOOM_QUEUE_WORKER/);
  });
});
