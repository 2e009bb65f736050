import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/*
 * Imports go one way (DEVELOPERS.md, "Layout"). The zones below are that rule written down, so a
 * wrong import fails `npm run lint` instead of waiting for a reviewer:
 * - shared/ stands alone; src/ and server/ never import each other.
 * - Client: app/ and deck/ compose; shell/ is the frame both apps share; a feature never imports
 *   another feature, app/, deck/ or shell/; lib/ and components/ import no feature.
 * - Server: lib/ and middleware/ import no feature; features import only the features listed
 *   before them in SERVER_LAYERS; app.ts (and index.ts, demo/, cli/) compose them.
 */
const CLIENT_FEATURES = [
  'attachments',
  'auth',
  'board',
  'checklists',
  'deck',
  'programs',
  'review',
  'service',
  'sync',
  'team',
  'vessels',
];

/** Lowest first: each server feature may import the ones before it, never one after it. */
const SERVER_LAYERS = [
  'workshops',
  'health',
  'audit',
  'mail',
  'users',
  'auth',
  'vessels',
  'team',
  'account',
  'checklists',
  'programs',
  'runs',
  'sync',
  'signoff',
  'review',
  'reminders',
  'attachments',
];

const sharedMayNotImport = [
  '**/src/**',
  '**/server/**',
  'node:*',
  'typeorm',
  'dexie',
  'dexie-react-hooks',
  'react',
  'react-dom',
  'express',
];

const clientZones = [
  ...CLIENT_FEATURES.map((feature) => ({
    target: `./src/features/${feature}`,
    from: './src/features',
    except: [`./${feature}`],
    message: 'A feature never imports another feature: compose them in app/, deck/ or shell/.',
  })),
  {
    target: './src/features',
    from: ['./src/app', './src/deck', './src/shell'],
    message: 'Features are composed by app/, deck/ and shell/, never the other way round.',
  },
  {
    target: ['./src/lib', './src/components'],
    from: ['./src/features', './src/app', './src/deck', './src/shell'],
    message: 'lib/ and components/ are building blocks: they import no feature and no app.',
  },
  {
    target: './src/shell',
    from: ['./src/app', './src/deck'],
    message: 'shell/ is shared by both apps, so it imports neither.',
  },
  {
    target: './src/deck',
    from: './src/app',
    message: 'The deck app imports nothing from the workshop app (shared parts live in shell/).',
  },
  {
    target: './src/app',
    from: './src/deck',
    message: 'The workshop app imports nothing from the deck app (shared parts live in shell/).',
  },
];

const serverZones = [
  {
    target: ['./server/lib', './server/middleware'],
    from: './server/features',
    message: 'server/lib and server/middleware import no feature.',
  },
  ...SERVER_LAYERS.slice(0, -1).map((feature, i) => ({
    target: `./server/features/${feature}`,
    from: SERVER_LAYERS.slice(i + 1).map((later) => `./server/features/${later}`),
    message: `Server features import one way (SERVER_LAYERS in eslint.config.js): ${feature} may import only ${SERVER_LAYERS.slice(0, i).join(', ') || 'no other feature'}.`,
  })),
];

const sideZones = [
  { target: './shared', from: ['./src', './server'], message: 'shared/ is pure.' },
  { target: './src', from: './server', message: 'The client never imports server code.' },
  { target: './server', from: './src', message: 'The server never imports client code.' },
];

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'test-results/', 'data/', 'dev-dist/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/extensions': importX.flatConfigs.typescript.settings['import-x/extensions'],
      'import-x/parsers': importX.flatConfigs.typescript.settings['import-x/parsers'],
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      '@typescript-eslint/no-unsafe-function-type': 'off',
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': [
        'error',
        { zones: [...sideZones, ...clientZones, ...serverZones] },
      ],
    },
  },
  {
    // A server test arranges records of several features; the layers bind product code only.
    files: ['server/**/*.test.ts'],
    rules: {
      'import-x/no-restricted-paths': ['error', { zones: [...sideZones, ...clientZones] }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: sharedMayNotImport,
              message: 'shared/ is pure: no client, server, Node, database or UI imports.',
            },
          ],
        },
      ],
    },
  },
);
