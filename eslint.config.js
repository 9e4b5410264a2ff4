// Lint: typescript-eslint's recommended rules and the React hooks rules, plus the import boundaries
// that keep the tree one-way (shared ← src, shared ← server; features apart). Import circles and
// duplicate code are checked by dependency-cruiser and jscpd in `npm run lint` (scripts/lint.ts).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

/**
 * @param {string[]} groups
 * @param {string} message
 * @returns {import('eslint').Linter.RulesRecord}
 */
const noImportFrom = (groups, message) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: groups, message }] }],
});

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'data/**', '.test-output/**', '.tsbuild/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
  {
    files: ['**/*.d.ts'],
    rules: { '@typescript-eslint/no-unused-vars': 'off' },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    rules: noImportFrom(
      ['**/src/**', '**/server/**', '**/tests/**', '**/scripts/**', 'node:*', 'react', 'three', 'express', 'kysely', 'pg'],
      'shared/ is pure TypeScript for client and server: it imports nothing from src, server, tests, Node, React, three or the database.',
    ),
  },
  {
    files: ['server/**/*.ts'],
    rules: {
      ...noImportFrom(['**/src/**'], 'The server never imports the client (src/).'),
      // Logs go through the request's logger (ctx.log) or the app's (services.logger), so every
      // line is structured and carries its request id. The command-line tools print.
      'no-console': 'error',
    },
  },
  {
    files: ['server/cli/**/*.ts', 'server/index.ts', 'server/**/*.test.ts'],
    rules: { 'no-console': 'off' },
  },
  {
    // SQL lives in repositories: routes and services call them (a service may hand a transaction down).
    files: ['server/features/**/*.ts'],
    ignores: ['server/features/**/*.repository.ts', 'server/features/**/*.test.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector:
            'CallExpression > MemberExpression.callee[property.name=/^(selectFrom|insertInto|updateTable|deleteFrom|replaceInto|mergeInto)$/]',
          message: "Queries belong in the feature's *.repository.ts.",
        },
        {
          selector: "ImportDeclaration[source.value='kysely'] ImportSpecifier[imported.name='sql']",
          message: "Raw SQL belongs in the feature's *.repository.ts.",
        },
      ],
    },
  },
);
