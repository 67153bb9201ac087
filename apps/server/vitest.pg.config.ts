// The server suite against a PostgreSQL server (HEXLOOM_TEST_DATABASE_URL, set by scripts/test.sh): every API spec plus
// the specs that need two servers on one database.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'server-postgres',
    root: import.meta.dirname,
    include: ['src/**/*.spec.ts', 'test/**/*.spec.ts', 'test-pg/**/*.spec.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 120_000,
  },
});
