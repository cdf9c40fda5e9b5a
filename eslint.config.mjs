// ESLint flat config (https://eslint.org/docs/latest/use/configure/configuration-files).
// What it guards, beyond the usual TypeScript and React rules:
// - no import cycles anywhere (a cycle hides an order dependency at start-up);
// - lib/ never imports components/ or app/ (the engine and services stay usable
//   from the CLI, workers and tests without the UI);
// - lib/ has no non-null assertions (a `!` there is an unchecked claim about data
//   that came from a user or the database).
// Formatting is Prettier's job (.prettierrc.json); eslint-config-prettier turns off
// the stylistic rules that would fight it.
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import nextPlugin from '@next/eslint-plugin-next';
import prettierConfig from 'eslint-config-prettier';

export default tseslint.config(
  {
    ignores: [
      '.next/**',
      'node_modules/**',
      'data/**',
      'test-results/**',
      'tmp/**',
      'tmp-*/**',
      'next-env.d.ts',
      'public/**',
    ],
  },
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/extensions': importX.flatConfigs.typescript.settings['import-x/extensions'],
      'import-x/parsers': importX.flatConfigs.typescript.settings['import-x/parsers'],
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
    },
  },
  {
    files: ['lib/**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-non-null-assertion': 'error',
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/components/*', '@/app/*', '**/components/*', '**/app/*'],
              message: 'lib/ must not depend on the UI (components/) or on routes (app/).',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks, '@next/next': nextPlugin },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...nextPlugin.configs.recommended.rules,
      ...nextPlugin.configs['core-web-vitals'].rules,
    },
  },
  prettierConfig,
);
