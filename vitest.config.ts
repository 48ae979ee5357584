/// <reference types="vitest/config" />
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// Workers inherit this; dates in tests must not depend on the machine's zone.
process.env.TZ = 'UTC';

/**
 * One config, four projects. `npm test` runs them in phases (scripts/test.ts); one project alone:
 * `npx vitest run --project unit`, one file: `npx vitest run --project web web/src/app/x.test.tsx`.
 */
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    env: { TZ: 'UTC' },
    // Two cores: more workers only fight over them.
    maxWorkers: 2,
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['core/**/*.test.ts', 'fake-services/**/*.test.ts', 'scripts/**/*.test.ts', 'tests/*.test.ts'],
        },
      },
      {
        extends: true,
        plugins: [react()],
        test: {
          name: 'web',
          environment: 'jsdom',
          include: ['web/src/**/*.test.{ts,tsx}'],
          setupFiles: ['web/src/testing/setup-tests.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          environment: 'node',
          include: ['api/**/*.test.ts'],
          globalSetup: ['api/test/global-setup.ts'],
          pool: 'forks',
          maxWorkers: 2,
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/support/global-setup.ts'],
          // One app and one browser are shared: files run one after another.
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
