import js from '@eslint/js'
import globals from 'globals'
import reactHooks from 'eslint-plugin-react-hooks'
import tseslint from 'typescript-eslint'
import { boundaryConfig, staleEntityImports } from './eslint.boundaries.js'

// TEMPORARY (#13): module files that still read another module's entities (paths under server/modules), as found
// when the rule came in. The server half of #13 moves these behind service APIs; delete each entry as its fix lands.
// Add none: a new cross-module entity import fails lint.
const ENTITY_IMPORTS_BEING_REMOVED = {
  'escalation/deliver.ts': ['completions/completion.entities.ts', 'tasks/task.entity.ts'],
  'escalation/digest.ts': ['completions/completion.entities.ts', 'people/person.entity.ts', 'tasks/task.entity.ts'],
  'escalation/escalate.ts': ['completions/completion.entities.ts', 'tasks/task.entity.ts'],
  'escalation/escalation.service.ts': ['completions/completion.entities.ts', 'people/person.entity.ts', 'tasks/task.entity.ts'],
  'escalation/ladders.service.ts': ['completions/completion.entities.ts', 'parameters/parameter.entities.ts', 'routines/routine.entity.ts', 'tasks/task.entity.ts'],
  'escalation/messages.ts': ['completions/completion.entities.ts', 'tasks/task.entity.ts'],
  'escalation/recipients.ts': ['people/person.entity.ts', 'roster/roster.entities.ts', 'tasks/task.entity.ts'],
  'reports/reports.routes.ts': ['audit/audit.entity.ts'],
  'reports/reports.service.ts': ['completions/completion.entities.ts', 'tasks/task.entity.ts'],
  'reports/tank-overview.service.ts': ['completions/completion.entities.ts', 'parameters/parameter.entities.ts', 'playbooks/playbook.entities.ts', 'tasks/task.entity.ts'],
}

// Keeps the list honest: once a file stops importing an entity, lint asks for its entry to go.
const stale = staleEntityImports(import.meta.dirname, ENTITY_IMPORTS_BEING_REMOVED)
if (stale.length > 0) throw new Error(`eslint.config.js: delete from ENTITY_IMPORTS_BEING_REMOVED (no longer imported): ${stale.join(', ')}`)

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
        { patterns: [{ group: ['react', 'express', 'typeorm', '**/src/**', '**/server/**', '#server/*'], message: 'shared/ stays free of client, server and ORM code.' }] },
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
        { selector: "CallExpression[callee.object.name='z'][callee.property.name='string']", message: 'Declare strings with text() from shared/schemas/text.ts: it refuses malformed Unicode with a 400.' },
      ],
    },
  },
  ...boundaryConfig({ root: import.meta.dirname, allowedEntityImports: ENTITY_IMPORTS_BEING_REMOVED }),
)
