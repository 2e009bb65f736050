import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// Imports go one way (STYLE.md): shared/ stands alone, src/ and server/ never import each other,
// and features reach each other only through app/ composition.
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

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'test-results/', 'data/', 'dev-dist/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      '@typescript-eslint/no-unsafe-function-type': 'off',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': [
        'error',
        {
          patterns: [{ group: ['**/server/**'], message: 'The client never imports server code.' }],
        },
      ],
    },
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
  {
    files: ['server/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/src/**'], message: 'The server never imports client code.' }] },
      ],
    },
  },
);
