import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const alias = {
  '@tunnelwright/aero': fileURLToPath(new URL('./libs/aero/src/index.ts', import.meta.url)),
  '@tunnelwright/contracts': fileURLToPath(new URL('./libs/contracts/src/index.ts', import.meta.url)),
  '@tunnelwright/db': fileURLToPath(new URL('./libs/db/src/index.ts', import.meta.url)),
};

/**
 * Three suites, run in this order by scripts/test.sh:
 * - unit: pure code, no services.
 * - integration: supertest and workers against the real PostgreSQL, Redis and SMTP fake started by scripts/services.sh.
 * - browser: playwright-core driving Debian's chromium against a served build.
 */
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          environment: 'node',
          include: ['libs/**/*.spec.ts', 'apps/api/src/**/*.spec.ts', 'apps/worker/src/**/*.spec.ts', 'scripts/**/*.spec.ts', 'docker/**/*.spec.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'integration',
          environment: 'node',
          include: ['apps/api/test/**/*.test.ts', 'apps/worker/test/**/*.test.ts'],
          // One shared test database: files run one after another so fixtures never collide.
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          environment: 'node',
          include: ['apps/web/e2e/**/*.e2e.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
