// Server tests: unit specs beside the code, API specs in test/, all on in-memory PGlite.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'server',
    root: import.meta.dirname,
    include: ['src/**/*.spec.ts', 'test/**/*.spec.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
