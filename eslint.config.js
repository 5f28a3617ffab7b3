import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';
import tanstackQuery from '@tanstack/eslint-plugin-query';

// Dependency direction is one way: calc ← shared ← {server, ui}; calc ← print ← server; db ← server;
// ui never imports server, db or print.
const zones = [
  {
    target: './calc',
    from: ['./shared', './print', './db', './server', './ui'],
    message: 'calc is the pure core: it imports no other workspace.',
  },
  {
    target: './shared',
    from: ['./print', './db', './server', './ui'],
    message: 'shared depends on calc only.',
  },
  {
    target: './print',
    from: ['./shared', './db', './server', './ui'],
    message:
      'print is pure: plain data in, PDF bytes out; it imports calc only (its input types are its own).',
  },
  {
    target: './db',
    from: ['./calc', './shared', './print', './server', './ui'],
    message: 'db depends on no other workspace.',
  },
  {
    target: './ui',
    from: ['./server', './db', './print'],
    message: 'ui never imports server, db or print.',
  },
  { target: './server', from: ['./ui'], message: 'server must not import ui.' },
];
const packageBans = {
  calc: ['@holdfast/shared', '@holdfast/print', '@holdfast/db', '@holdfast/server', '@holdfast/ui'],
  shared: ['@holdfast/print', '@holdfast/db', '@holdfast/server', '@holdfast/ui'],
  print: ['@holdfast/shared', '@holdfast/db', '@holdfast/server', '@holdfast/ui'],
  db: ['@holdfast/calc', '@holdfast/shared', '@holdfast/print', '@holdfast/server', '@holdfast/ui'],
  ui: ['@holdfast/server', '@holdfast/db', '@holdfast/print'],
};

// UI features are independent slices: a feature imports lib/, components/ and config/, never
// another feature, except where one names the other's concept (a sheet is opened for a register
// position). Screens in app/ compose features. (Matched on the import text: import-x's path
// zones do not resolve the UI's extensionless imports.)
const featureEdges = { sheets: ['register'] };
function uiFeatureBoundaries() {
  const features = readdirSync(new URL('./ui/src/features', import.meta.url), {
    withFileTypes: true,
  })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);
  return features.map((feature) => {
    const others = features.filter((f) => f !== feature && !featureEdges[feature]?.includes(f));
    return {
      files: [`ui/src/features/${feature}/**/*.{ts,tsx}`],
      rules: {
        'no-restricted-imports': [
          'error',
          {
            paths: packageBans.ui.map((name) => ({
              name,
              message: `ui must not depend on ${name}.`,
            })),
            patterns: [
              {
                regex: `^(\\.\\./)+(features/)?(${others.join('|')})(/|$)`,
                message: `ui feature "${feature}" must not import another feature: move what both use to ui/src/components or ui/src/lib.`,
              },
            ],
          },
        ],
      },
    };
  });
}

const calcDoor = {
  name: '@holdfast/calc',
  allowTypeImports: true,
  message: 'Reach the calculation core through server/src/calc (calc-engine.ts).',
};
const queryBuilderBans = [
  { name: 'kysely', message: 'Only repositories (*.repository.ts) use the query builder.' },
  {
    name: '@holdfast/db',
    importNames: ['createDatabase', 'createPool'],
    message: 'Only repositories (*.repository.ts) use the database.',
  },
];
const databaseHandleBan = [
  {
    group: ['**/database/database.js'],
    message: 'Only repositories (*.repository.ts) use the database handle.',
  },
];
export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', 'test-output/**', 'ui/dist/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    plugins: { 'import-x': importX },
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-empty-object-type': 'off',
      'no-empty': ['error', { allowEmptyCatch: true }],
    },
  },
  {
    // Tests may poke at loosely typed responses; product code may not.
    files: ['**/*.test.ts', '**/test/**', 'ui/e2e/**', 'scripts/test/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['ui/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks, '@tanstack/query': tanstackQuery },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      ...tanstackQuery.configs['flat/recommended'][0].rules,
    },
  },
  ...Object.entries(packageBans).map(([ws, banned]) => ({
    files: [`${ws}/**/*.{ts,tsx,js,mjs}`],
    rules: {
      'no-restricted-imports': [
        'error',
        { paths: banned.map((name) => ({ name, message: `${ws} must not depend on ${name}.` })) },
      ],
    },
  })),
  ...uiFeatureBoundaries(),
  // Print's own Text never breaks a word where its font changes (print/src/text.tsx); charts
  // draw SVG text, and the tests render react-pdf's own Text on purpose.
  {
    files: ['print/src/**/*.tsx'],
    ignores: ['print/src/text.tsx', 'print/src/parts/chart.tsx'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            ...packageBans.print.map((name) => ({
              name,
              message: `print must not depend on ${name}.`,
            })),
            {
              name: '@react-pdf/renderer',
              importNames: ['Text'],
              message:
                "Import Text from print/src/text.tsx: react-pdf's own breaks words where the font changes, with a hyphen.",
            },
          ],
        },
      ],
    },
  },

  // One door into the calculation core on the server: its values (evaluation, sheet types,
  // criteria specs) come through server/src/calc.
  {
    files: ['server/src/**/*.{ts,tsx}'],
    ignores: ['server/src/calc/**'],
    rules: { '@typescript-eslint/no-restricted-imports': ['error', { paths: [calcDoor] }] },
  },
  // Kysely only in repositories: services and controllers speak to repositories, never to the
  // query builder or the database handle; a unit of work is an opaque `Tx` from `UnitOfWork`.
  // The rule replaces the calc door above for these files, so it carries the door too.
  {
    files: ['server/src/**/*.service.ts', 'server/src/**/*.controller.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { paths: [calcDoor, ...queryBuilderBans], patterns: databaseHandleBan },
      ],
    },
  },
);
