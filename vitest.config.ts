import { configDefaults, defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    environment: 'node',
    testTimeout: 30_000,
    pool: 'forks',
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'cli/**/*.test.ts', 'server/**/*.test.ts', 'tests/**/*.test.ts'],
          exclude: [...configDefaults.exclude, 'tests/api/**', 'tests/e2e/**'],
        },
      },
      {
        // API tests: supertest against createApp with a throwaway MariaDB (tests/setup/mariadb.ts).
        extends: true,
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          globalSetup: ['tests/setup/mariadb.ts'],
          hookTimeout: 60_000,
        },
      },
      {
        // Browser tests: Debian's Chromium (playwright-core) against the app serving dist/web, on the
        // throwaway MariaDB of tests/setup/mariadb.ts, as the API tests. Build dist/web first (scripts/test.sh does).
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.e2e.test.ts'],
          globalSetup: ['tests/setup/mariadb.ts'],
          testTimeout: 120_000,
          hookTimeout: 300_000,
        },
      },
      // Component tests of the web app (jsdom, React): their own config beside them.
      'tests/web/vitest.config.ts',
    ],
  },
});
