// One lint configuration for every workspace; `npm run lint` runs it with --max-warnings 0.
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const CLIENT_FEATURES = ['auth', 'meets', 'clubs', 'results', 'standings', 'rack', 'trials', 'insights', 'field-notes', 'search'];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', 'client/public/**', '**/*.cjs'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: ['*/tsconfig.json'] })],
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      'import-x/order': ['error', { groups: ['builtin', 'external', 'internal', ['parent', 'sibling', 'index']], 'newlines-between': 'always' }],
      'import-x/no-cycle': ['error', { maxDepth: 6, ignoreExternal: true }],
      'import-x/no-duplicates': 'error',
    },
  },
  {
    // Decorator metadata needs the value import of DTO classes: tell the rule about it.
    files: ['server/**/*.ts'],
    languageOptions: { parserOptions: { emitDecoratorMetadata: true, experimentalDecorators: true } },
  },
  {
    files: ['shared/src/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['react', 'react-*', '@mui/*', '@nestjs/*', 'typeorm', 'mysql2', 'express'], message: 'shared is pure domain code: no framework imports.' },
          { group: ['node:*', 'fs', 'path', 'crypto', 'http', 'os', 'child_process'], message: 'shared runs in the browser too: no Node built-ins.' },
        ],
      }],
    },
  },
  {
    files: ['client/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
      'import-x/no-restricted-paths': ['error', {
        zones: CLIENT_FEATURES.map((feature) => ({
          target: `./client/src/features/${feature}`,
          from: './client/src/features',
          except: [`./${feature}`],
          message: 'A feature never imports another feature; move the shared part to components/ or lib/.',
        })),
      }],
    },
  },
  {
    files: ['**/*.test.{ts,tsx}', '**/*.spec.ts', '**/*.e2e-spec.ts', '**/test/**', '**/e2e/**', 'scripts/**'],
    rules: { '@typescript-eslint/no-non-null-assertion': 'off' },
  },
);
