// Expo's flat config plus import sorting, type-only imports, Prettier's formatting rules off, and
// the layer rules of the README, so that breaking a layer fails the lint.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const prettierConfig = require('eslint-config-prettier');
const simpleImportSort = require('eslint-plugin-simple-import-sort');

const restrictedImports = (patterns) => ['error', { patterns }];

module.exports = defineConfig([
  expoConfig,
  prettierConfig,
  {
    ignores: ['dist/*', 'data/*', '.expo/*', 'test-results/*', 'expo-env.d.ts'],
  },
  {
    plugins: { 'simple-import-sort': simpleImportSort },
    rules: {
      'simple-import-sort/imports': 'error',
      'simple-import-sort/exports': 'error',
      'import/order': 'off',
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
    },
  },
  {
    // Server: router (validate → call → respond) → service → repository. Only repositories
    // touch the database, and each starts from the scoped query builders.
    files: ['server/**/*.router.ts', 'server/**/*.service.ts'],
    rules: {
      'no-restricted-imports': restrictedImports([
        {
          group: ['kysely', 'kysely/*'],
          message: 'Routers and services do not build SQL: put the query in a repository.',
        },
        {
          group: ['**/access/scoped'],
          message: 'Only repositories start queries from `scoped`.',
        },
      ]),
    },
  },
  {
    // Repositories answer rows or `undefined`; services decide what is an HTTP error.
    files: ['server/**/*.repository.ts'],
    rules: {
      'no-restricted-imports': restrictedImports([
        {
          group: ['**/http/http-error'],
          message: 'A repository answers rows or undefined; its service decides the HTTP error.',
        },
      ]),
    },
  },
  {
    // Documents are drawn from the data they are given: no server code, database or HTTP.
    files: ['documents/**/*.ts'],
    rules: {
      'no-restricted-imports': restrictedImports([
        {
          group: ['@/server', '@/server/*', '**/server/*'],
          message: 'A renderer takes its data as an argument: it imports no server code.',
        },
        {
          group: ['kysely', 'kysely/*', 'better-sqlite3', 'express', 'node:http', 'node:https'],
          message: 'A renderer does no database or HTTP work: the server gathers the data first.',
        },
      ]),
      'no-restricted-globals': [
        'error',
        {
          name: 'fetch',
          message: 'A renderer does no HTTP work: the server gathers the data first.',
        },
      ],
    },
  },
  {
    // Client: route → screen → hook → API client. Screens and components reach the API only
    // through the hooks in hooks/queries.
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}'],
    ignores: ['components/screens/work-import/read-csv-file.ts'],
    rules: {
      'no-restricted-imports': restrictedImports([
        {
          group: ['@/hooks/api-client', '**/hooks/api-client', '@/hooks/upload', '**/hooks/upload'],
          message: 'Screens and components get data through the hooks in hooks/queries.',
        },
      ]),
      'no-restricted-globals': [
        'error',
        { name: 'fetch', message: 'Call the API through a hook in hooks/queries.' },
        { name: 'XMLHttpRequest', message: 'Call the API through a hook in hooks/queries.' },
      ],
    },
  },
  {
    // Every file under app/ becomes a route, so each one is a route: it default-exports a screen.
    files: ['app/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: 'Program:not(:has(ExportDefaultDeclaration))',
          message:
            'Only routes live in app/: default-export a screen or layout, and keep helpers and tests elsewhere.',
        },
      ],
    },
  },
]);
