// Faults on PostgreSQL: the built server (`npm run build` first, as scripts/test.sh does) is killed with SIGKILL in the
// middle of saves and uploads, again and again, on one PostgreSQL database; after the last restart each acknowledged
// write is there and nothing half-written is. The data-folder run of the same cycles is e2e/faults.e2e.ts.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, it } from 'vitest';
import { expectNothingLost, runKillCycles } from '../../../e2e/support/kill-cycles.js';
import { freshServerDatabase } from '../test/support/test-app.js';

const CYCLES = 6;
const dataDir = mkdtempSync(join(tmpdir(), 'hexloom-faults-pg-'));

afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

describe('a server on PostgreSQL killed during writes', () => {
  it(`keeps every acknowledged save and upload over ${CYCLES} SIGKILL and restart cycles`, async () => {
    const databaseUrl = await freshServerDatabase();
    if (!databaseUrl) throw new Error('HEXLOOM_TEST_DATABASE_URL is not set: run this suite through scripts/test.sh');
    const result = await runKillCycles(CYCLES, { dataDir, env: { DATABASE_URL: databaseUrl, SESSION_SECRET: 'faults-session-secret' } });
    process.stdout.write(expectNothingLost('PostgreSQL', CYCLES, result));
  }, 600_000);
});
