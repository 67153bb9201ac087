// One vitest run over every workspace: fast unit projects, and the browser project.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['libs/*/src/**/*.test.ts', 'libs/*/test/**/*.test.ts', 'apps/cli/src/**/*.test.ts', 'apps/cli/test/**/*.test.ts', 'examples/**/*.test.ts'],
          environment: 'node',
        },
      },
      './apps/server/vitest.config.ts',
      './apps/web/vitest.config.ts',
      {
        test: {
          name: 'browser',
          include: ['e2e/**/*.e2e.ts'],
          environment: 'node',
          testTimeout: 120_000,
          hookTimeout: 180_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
