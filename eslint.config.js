// Import boundaries of the house style (DEVELOPERS.md, "Where code lives").
import tseslint from 'typescript-eslint';

const restrict = (files, patterns, message) => ({
  files,
  rules: {
    '@typescript-eslint/no-restricted-imports': [
      'error',
      { patterns: [{ group: patterns, message, allowTypeImports: false }] },
    ],
  },
});

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', '.data/**', 'coverage/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
  restrict(
    ['shared/**/*.ts'],
    ['**/cli/**', '**/server/**', '**/src/**', 'node:*', 'fs', 'path', 'os', 'child_process', 'worker_threads', 'piscina'],
    'shared/ is pure: no I/O and no imports from cli, server or src.',
  ),
  restrict(['cli/**/*.ts'], ['**/server/**', '**/src/**'], 'cli imports shared only, never server or src.'),
  restrict(['server/**/*.ts'], ['**/cli/**', '**/src/**'], 'server imports shared only, never cli or src.'),
  {
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    rules: { 'no-console': 'error' },
  },
);
