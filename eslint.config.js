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
  restrict(['src/**/*.ts', 'src/**/*.tsx'], ['**/cli/**', '**/server/**', 'node:*'], 'src (the web app) imports shared only, never cli or server, and no Node built-ins.'),
  {
    files: ['src/features/**/*.ts', 'src/features/**/*.tsx'],
    rules: {
      '@typescript-eslint/no-restricted-imports': ['error', { patterns: [{ group: ['@/features/*', '@/app/*', '../../*/**'], message: 'No imports between web features or from the app layer: compose features in src/app.' }] }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    rules: { 'no-console': 'error' },
  },
);
