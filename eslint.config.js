import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import pluginQuery from '@tanstack/eslint-plugin-query';
import { importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';

/** Imports that would break the three code roots' boundaries (see DEVELOPERS.md). */
const zone = (patterns, message) => ['error', { patterns: [{ group: patterns, message }] }];
const NODE_AND_FRAMEWORKS = ['node:*', 'express', 'knex', 'pg', 'react', 'react-dom', 'react-*', '@tanstack/*', 'fs', 'path', 'crypto'];

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'web/dist/', '.data/', 'coverage/', 'test-results/'] },
  js.configs.recommended,
  // The type-checked preset's no-unsafe-* rules fire on every Knex row; we take its promise rules by name instead.
  ...tseslint.configs.recommended,
  {
    languageOptions: {
      parserOptions: { projectService: { allowDefaultProject: ['*.js', 'scripts/*.mjs'] }, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node },
    },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [
        createTypeScriptImportResolver({ project: ['tsconfig.json', 'web/tsconfig.json'], noWarnOnMultipleProjects: true }),
      ],
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { arguments: false } }],
      '@typescript-eslint/await-thenable': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      'import-x/no-cycle': 'error',
    },
  },
  {
    files: ['core/**/*.ts'],
    rules: {
      'no-restricted-imports': zone(
        [...NODE_AND_FRAMEWORKS, '@/*', '@api/*', '../api/*', '../web/*'],
        'core/ is isomorphic: it imports nothing from Node, React, Express, Knex, web/ or api/.',
      ),
    },
  },
  {
    files: ['api/**/*.ts'],
    rules: { 'no-restricted-imports': zone(['@/*', '**/web/src/*'], 'api/ never imports from web/.') },
  },
  {
    files: ['web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks, '@tanstack/query': pluginQuery },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...pluginQuery.configs.recommended.rules,
      'no-restricted-imports': zone(
        ['@api/*', '**/api/src/*', 'node:*', 'express', 'knex', 'pg'],
        'web/ never imports from api/ or Node-only packages.',
      ),
    },
  },
  {
    // Tests run in Node under vitest and may read files; they are never bundled.
    files: ['web/**/*.test.{ts,tsx}', 'web/src/testing/**'],
    rules: { 'no-restricted-imports': zone(['@api/*', '**/api/src/*', 'express', 'knex', 'pg'], 'web/ never imports from api/.') },
  },
);
