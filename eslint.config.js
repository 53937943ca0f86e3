import js from '@eslint/js'
import globals from 'globals'
import reactHooks from 'eslint-plugin-react-hooks'
import tseslint from 'typescript-eslint'
import { boundaryConfig } from './eslint.boundaries.js'

export default tseslint.config(
  { ignores: ['dist', 'node_modules', '.data', 'coverage', 'server/db/migrations/*-*.ts', 'tests/fixtures/lint'] },
  {
    files: ['**/*.{ts,tsx}'],
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    languageOptions: { ecmaVersion: 2023, globals: { ...globals.browser, ...globals.node } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // We do not run the React Compiler, so its memoisation warnings do not apply.
      'react-hooks/incompatible-library': 'off',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/server/**', '#server/*'], message: 'The client and shared code never import the server.' }] },
      ],
    },
  },
  {
    files: ['server/**/*.ts', 'seed/**/*.ts', 'tests/**/*.ts', 'scripts/**/*.ts'],
    rules: { 'no-restricted-imports': 'off' },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['react', 'express', 'typeorm', '**/src/**', '**/server/**', '#server/*'], message: 'shared/ stays free of client, server and ORM code.' },
          ],
        },
      ],
    },
  },
  {
    // Every string field starts from text(), which refuses malformed Unicode (record 12c).
    files: ['shared/**/*.ts', 'server/**/*.ts', 'src/**/*.{ts,tsx}'],
    ignores: ['shared/schemas/text.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: "CallExpression[callee.object.name='z'][callee.property.name='string']",
          message: 'Declare strings with text() from shared/schemas/text.ts: it refuses malformed Unicode with a 400.',
        },
      ],
    },
  },
  // No module reads another module's entities any more (#13): a new cross-module entity import fails lint.
  ...boundaryConfig({ root: import.meta.dirname }),
)
