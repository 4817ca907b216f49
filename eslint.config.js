import js from '@eslint/js';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import pluginQuery from '@tanstack/eslint-plugin-query';
import jsxA11y from 'eslint-plugin-jsx-a11y';
import i18next from 'eslint-plugin-i18next';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import tseslint from 'typescript-eslint';

/** The layers: nothing imports upwards (DEVELOPERS.md, "Architecture"). */
const layerZones = [
  { target: './shared/geometry', from: ['./shared/schemas', './shared/auth', './shared/types', './grading', './planning', './server', './src', './exports'], message: 'The geometry kernel is the bottom layer.' },
  { target: './shared', from: ['./grading', './planning', './server', './src', './exports'], message: 'shared/ is isomorphic and imports no app layer.' },
  { target: './grading', from: ['./planning', './server', './src', './exports'], message: 'grading imports only shared.' },
  { target: './planning', from: ['./server', './src', './exports'], message: 'planning imports shared and grading/index.ts only.' },
  { target: './exports', from: ['./server', './src'], message: 'exports is plain data in, bytes out.' },
  { target: './src', from: ['./server', './exports'], message: 'The client never imports server or exports.' },
];

/** Client areas: one may use another's query hooks (api/) and hooks (hooks/), never its screens or internals. */
const FEATURES = readdirSync(join(import.meta.dirname, 'src', 'features'), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);
const crossFeatureZones = FEATURES.map((f) => ({
  target: `./src/features/${f}`,
  from: './src/features',
  except: [`./${f}`, ...FEATURES.filter((o) => o !== f).flatMap((o) => [`./${o}/api`, `./${o}/hooks`])],
  message: 'Another area is reached only through its api/ query hooks or its hooks/.',
}));

const pureCoreRules = {
  'no-restricted-imports': [
    'error',
    {
      patterns: [
        { group: ['node:*', 'fs', 'path', 'child_process', 'worker_threads'], message: 'Pure cores do no I/O.' },
        { group: ['express', 'typeorm', 'react', 'react-dom', 'better-sqlite3'], message: 'Pure cores stay framework-free.' },
      ],
    },
  ],
  'no-restricted-globals': ['error', { name: 'process', message: 'Pass configuration in as arguments.' }],
  'no-restricted-properties': [
    'error',
    { object: 'Date', property: 'now', message: 'Take `now` as an argument.' },
    { object: 'Math', property: 'random', message: 'Take a seeded rng as an argument.' },
  ],
};

export default tseslint.config(
  { ignores: ['**/*.d.ts', 'dist/**', 'node_modules/**', 'data/**', 'coverage/**', 'tests/e2e/screenshots/**', '*.mjs'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    // Without a TypeScript resolver the zones below never see an extensionless import (`'../server/app'`).
    settings: { 'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })] },
    rules: {
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-unsafe-function-type': 'off',
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: layerZones,
        },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error' },
  },
  { files: ['src/**/*.tsx'], ...jsxA11y.flatConfigs.recommended },
  {
    files: ['src/**/*.tsx'],
    rules: {
      // A scrolling table or drawing is a named region a keyboard user can reach and scroll (axe: scrollable-region-focusable).
      'jsx-a11y/no-noninteractive-tabindex': ['error', { roles: ['tabpanel', 'region'] }],
    },
  },
  ...pluginQuery.configs['flat/recommended'].map((c) => ({ ...c, files: ['src/**/*.{ts,tsx}'] })),
  {
    // Every word on a screen goes through i18next (English and French): no bare text in JSX.
    files: ['src/**/*.tsx'],
    // Areas still being moved to their words files; remove an area here once it is clean.
    ignores: [
      'src/features/{costing,floor,line,markers,people,purchasing}/**',
      'src/features/auth/components/new-studio-page.tsx',
    ],
    plugins: { i18next },
    rules: { 'i18next/no-literal-string': ['error', { mode: 'jsx-text-only' }] },
  },
  {
    // Stricter, where an area has been checked for it: also the words in labels, hints, placeholders, titles,
    // alternative text and column headers, and strings chosen inside markup (`{done ? 'Cut' : 'Planned'}`).
    files: ['src/**/*.tsx'],
    plugins: { i18next },
    rules: {
      'i18next/no-literal-string': [
        'error',
        {
          mode: 'jsx-only',
          'jsx-attributes': { include: ['^(aria-label|placeholder|title|alt|label|hint|header|description)$'] },
          callees: {
            exclude: ['t', 'i18n\\.t', 'Intl\\..*', '.*[Pp]aram.*', 'navigate', 'cn', 'clsx', 'get', 'set', 'has', 'startsWith',
              'includes', 'padStart', 'toFixed', 'replace', 'join', 'split', '.*register', 'watch', 'setValue', 'getValues', 'trigger'],
          },
          // Symbols (▲, ·, →) and identifiers (field names, input types: 'widthMm', 'number') are not words.
          words: { exclude: ['^[^A-Za-z]*$', '^[a-z][A-Za-z0-9._-]*$'] },
        },
      ],
    },
  },
  {
    files: ['src/features/**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    rules: { 'import-x/no-restricted-paths': ['error', { zones: [...layerZones, ...crossFeatureZones] }] },
  },
  {
    files: ['grading/**/*.ts', 'planning/**/*.ts', 'shared/**/*.ts'],
    ignores: ['**/*.test.ts'],
    rules: pureCoreRules,
  },
  {
    // The database stops at each module's setup: only the data layer and the files that build it import TypeORM
    // (tests/architecture/house.test.ts checks the same from the import graph).
    files: ['server/**/*.ts'],
    ignores: [
      'server/**/*.repository.ts',
      'server/**/*.entity.ts',
      'server/db/**',
      'server/**/*.module.ts',
      'server/modules/module.ts',
      'server/app.ts',
      'server/seed/**',
    ],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'typeorm', message: 'Only repositories, entities, migrations, server/db, module setup and the seed import TypeORM: query through a *.repository.ts.' }],
          patterns: [{ group: ['typeorm/*'], message: 'Only repositories, entities, migrations, server/db, module setup and the seed import TypeORM.' }],
        },
      ],
    },
  },
  {
    // Inside the data layer and setup, the Repository class still stays behind our own repository functions.
    files: ['server/**/*.repository.ts', 'server/**/*.entity.ts', 'server/db/**/*.ts', 'server/**/*.module.ts', 'server/modules/module.ts', 'server/app.ts', 'server/seed/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { paths: [{ name: 'typeorm', importNames: ['Repository'], message: 'Query through *.repository.ts.' }] },
      ],
    },
  },
);
