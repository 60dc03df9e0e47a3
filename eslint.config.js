// Type-aware linting, import cycles, consistent type imports, and the server's layering (docs/architecture.md).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import { importX } from 'eslint-plugin-import-x';

export default tseslint.config(
  {
    ignores: [
      'dist/**',
      'node_modules/**',
      '.data/**',
      'drizzle/**',
      'test-results/**',
      'coverage/**',
      'scripts/*.mjs',
      'eslint.config.js',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    plugins: { 'import-x': importX },
    settings: {
      // The TypeScript settings of import-x (extensions and parser), without which it reads no .ts file and sees no cycle.
      ...importX.flatConfigs.typescript.settings,
      'import-x/resolver': { typescript: true, node: true },
    },
    rules: {
      'import-x/no-cycle': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { arguments: false, attributes: false } }],
      '@typescript-eslint/only-throw-error': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/restrict-template-expressions': 'off',
      '@typescript-eslint/require-await': 'off',
      '@typescript-eslint/no-floating-promises': 'error',
      // Binary-content checks legitimately match control characters.
      'no-control-regex': 'off',
    },
  },
  {
    // A feature does not import another feature (docs/architecture.md).
    files: ['src/features/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@/features/*'], message: 'Features do not import each other; compose them in src/app.' }] },
      ],
    },
  },
  {
    // The server's layering (docs/architecture.md): the engine is pure, jobs are generic, plans and studies
    // share through the run kernel only, and routes go through services.
    files: ['server/**', 'scripts/**', 'tests/**'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './server/engine',
              from: './server',
              except: ['./engine'],
              message: 'The engine is pure computation: it imports nothing from the rest of the server.',
            },
            {
              target: './server/jobs',
              from: ['./server/plans', './server/studies', './server/runs', './server/demo', './server/horizon-preview'],
              message: 'Jobs are generic: register handlers from the composition root (server/job-kinds.ts) instead.',
            },
            {
              target: ['./server/plans', './server/studies'],
              from: './server/jobs',
              message: 'Plans and studies reach jobs only through the run kernel (server/runs/).',
            },
            {
              target: './server/studies',
              from: './server/plans',
              message: 'What plans and studies share lives in the run kernel (server/runs/).',
            },
            {
              target: './server/plans',
              from: './server/studies',
              message: 'What plans and studies share lives in the run kernel (server/runs/).',
            },
            {
              target: './server/runs',
              from: ['./server/studies', './server/plans'],
              except: ['./plans.repo.ts'],
              message: 'The run kernel knows no plan or study code (it reads the last approved plan through plans.repo.ts).',
            },
            {
              target: './server/**/*.routes.ts',
              from: ['./server/**/*.repo.ts', './server/db/**'],
              message: 'Routes call services, never repositories or the database.',
            },
          ],
        },
      ],
    },
  },
);
