// Test projects for `npm test`. Vitest prefers this file over vite.config.ts (the web
// client's build config), and inline projects load no config file of their own, so
// none of the client's plugins or dev-server settings leak into the tests.
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const apiGlobalSetup = fileURLToPath(new URL('./tests/api/global-setup.ts', import.meta.url));

export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          sequence: { groupOrder: 0 },
          include: [
            'packages/**/src/**/*.test.ts',
            'apps/**/src/**/*.test.ts',
            'seed/**/*.test.ts',
          ],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          // The API tests share one database; running files one at a time keeps their rows apart.
          fileParallelism: false,
          sequence: { groupOrder: 0 },
          testTimeout: 30_000,
          globalSetup: existsSync(apiGlobalSetup) ? [apiGlobalSetup] : [],
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          // One browser and one server at a time: two cores do not run more in parallel.
          fileParallelism: false,
          // A group of their own, never beside the API tests: both use the one test database, and an
          // API test's outbox worker would otherwise send a browser test's mail into its own catcher.
          sequence: { groupOrder: 1 },
          testTimeout: 60_000,
        },
      },
    ],
  },
});
