// Component tests of the web app: `vitest run --config tests/web/vitest.config.ts`, or as the
// 'web' project of the root vitest.config.ts (projects: [..., 'tests/web/vitest.config.ts']).
// The Vite config brings the React plugin and the @/ and @shared/ aliases.
import { defineConfig, mergeConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';
import viteConfig from '../../vite.config';

const root = fileURLToPath(new URL('../..', import.meta.url));

export default mergeConfig(
  viteConfig,
  defineConfig({
    // The project root, also when run as a project of the root config: '/examples/...' globs resolve from it.
    root,
    test: {
      root,
      name: 'web',
      include: ['tests/web/**/*.test.tsx'],
      environment: 'jsdom',
      testTimeout: 30_000,
      pool: 'forks',
    },
  }),
);
