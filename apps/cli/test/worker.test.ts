// `hexloom worker` refuses, with a message naming what is missing, anything but a PostgreSQL server URL; the worker
// itself (taking chunks, killed mid-job, Ctrl-C) is checked against a real server in apps/server/test-pg/shared-queue.spec.ts.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CliError } from '../src/cli-error.js';
import { workerDatabaseUrl } from '../src/commands/worker.js';

const bin = fileURLToPath(new URL('../bin/hexloom.js', import.meta.url));

describe('hexloom worker', () => {
  it('takes the URL of the option, else of DATABASE_URL', () => {
    expect(workerDatabaseUrl('postgres://a@h/db', { DATABASE_URL: 'postgresql://b@h/db' })).toBe('postgres://a@h/db');
    expect(workerDatabaseUrl(undefined, { DATABASE_URL: 'postgresql://b@h/db' })).toBe('postgresql://b@h/db');
  });
  it('refuses no URL and a URL that is not PostgreSQL, without echoing a password', () => {
    expect(() => workerDatabaseUrl(undefined, {})).toThrow(CliError);
    expect(() => workerDatabaseUrl(undefined, {})).toThrow(/--database-url or DATABASE_URL/);
    expect(() => workerDatabaseUrl('mysql://root:hunter2@h/db', {})).toThrow(/postgres:\/\/ or postgresql:\/\//);
    expect(() => workerDatabaseUrl('mysql://root:hunter2@h/db', {})).not.toThrow(/hunter2/);
  });
  it('exits non-zero naming DATABASE_URL when started without a database', () => {
    const env = { ...process.env };
    delete env['DATABASE_URL'];
    const run = spawnSync(process.execPath, [bin, 'worker'], { encoding: 'utf8', env });
    expect(run.status).not.toBe(0);
    expect(run.stderr).toMatch(/DATABASE_URL/);
  }, 30_000);
});
