// Web component tests in jsdom.
import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

export default defineConfig({
  plugins: [react()],
  test: {
    name: 'web',
    root: import.meta.dirname,
    include: ['src/**/*.test.{ts,tsx}'],
    environment: 'jsdom',
    setupFiles: ['./src/test/setup.ts'],
    passWithNoTests: false,
    // jsdom renders the whole canvas and runs the solver in-thread: slow on a busy 2-core machine.
    testTimeout: 30_000,
  },
});
