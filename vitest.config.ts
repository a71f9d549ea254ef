import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Four projects, fastest first: shared (pure units), server (real PostgreSQL), client
// (components in jsdom), browser (real Chromium against the real server). The server tests
// share one database reset between files, so files run one at a time (2 cores anyway).
export default defineConfig({
  test: {
    fileParallelism: false,
    projects: [
      {
        test: {
          name: 'shared',
          include: ['shared/**/*.test.ts', 'scripts/**/*.test.ts', 'seeds/**/*.test.ts', 'tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'server',
          include: ['server/**/*.test.ts', 'tests/server/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/server/global-setup.ts'],
          setupFiles: ['tests/server/reset-between-files.ts'],
          testTimeout: 20000,
          hookTimeout: 60000,
        },
      },
      {
        plugins: [react()],
        test: {
          name: 'client',
          include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
          environment: 'jsdom',
          setupFiles: ['src/test/setup.ts'],
        },
      },
      {
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/browser/global-setup.ts'],
          testTimeout: 60000,
          hookTimeout: 120000,
        },
      },
    ],
  },
});
