import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Three projects, fastest first. The server project shares one test database and resets it
// between files, so it must run with --no-file-parallelism (see package.json "test:server").
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'shared',
          include: ['shared/**/*.test.ts', 'scripts/**/*.test.ts'],
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
    ],
  },
});
