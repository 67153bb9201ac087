// Faults: the built server is killed with SIGKILL in the middle of saves and uploads, again and again, on one data folder;
// after every restart each acknowledged write is there and nothing half-written is. The same cycles on PostgreSQL are in
// apps/server/test-pg/faults.spec.ts.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, it } from 'vitest';
import { expectNothingLost, runKillCycles } from './support/kill-cycles.js';

const CYCLES = 6;
const dataDir = mkdtempSync(join(tmpdir(), 'hexloom-faults-'));

afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

describe('a server killed during writes', () => {
  it(`keeps every acknowledged save and upload over ${CYCLES} SIGKILL and restart cycles`, async () => {
    const result = await runKillCycles(CYCLES, { dataDir });
    process.stdout.write(expectNothingLost('data folder', CYCLES, result));
  }, 600_000);
});
