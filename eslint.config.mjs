// Lint rules for the whole workspace (run by `npm test` before the suites).
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import importX from 'eslint-plugin-import-x';
import globals from 'globals';
import { readdirSync } from 'node:fs';
import tseslint from 'typescript-eslint';

// The architecture, enforced: libs never import apps; web features import shared code (components, lib,
// config, test) and never each other; the API's common folder never imports a feature folder; no import
// cycles anywhere. Features are found from the folders, so a new one is covered the day it is made.
const webFeatures = readdirSync(new URL('./apps/web/src/features', import.meta.url));
const apiFeatures = readdirSync(new URL('./apps/api/src', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory() && !['common', 'config', 'database'].includes(entry.name))
  .map((entry) => `./apps/api/src/${entry.name}`);

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', '**/coverage/**', '**/screenshots/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
      eqeqeq: ['error', 'smart'],
      'no-console': 'off',
    },
  },
  {
    // Nest injects by the constructor parameter's runtime type, so those imports must stay value imports.
    files: ['apps/api/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    files: ['apps/web/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['apps/**/*.{ts,tsx}', 'libs/**/*.ts'],
    plugins: { 'import-x': importX },
    settings: { 'import-x/resolver': { typescript: true, node: true } },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './libs', from: './apps', message: 'A library never imports an app.' },
            ...webFeatures.map((feature) => ({
              target: `./apps/web/src/features/${feature}`,
              from: './apps/web/src/features',
              except: [`./${feature}`],
              message: 'Web features do not import each other: move what both need to components/ or lib/.',
            })),
            { target: './apps/api/src/common', from: apiFeatures, message: "The API's common folder never imports a feature folder." },
          ],
        },
      ],
    },
  },
);
