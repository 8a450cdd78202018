// Lint rules, including the import boundaries of the house style:
// src/ and server/ never import each other; shared/ imports neither, nor any engine of one side.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

const restrict = (patterns) => ({ 'no-restricted-imports': ['error', { patterns }] });

export default tseslint.config(
  { ignores: ['dist/', 'dist-*/', 'node_modules/', '.data/', 'drizzle/', '.screenshots/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/**'],
    rules: restrict([
      {
        group: ['**/server/**', 'express', 'drizzle-orm', 'drizzle-orm/*', 'pg'],
        message: 'The client must not import server code.',
      },
    ]),
  },
  {
    files: ['server/**'],
    rules: restrict([
      {
        group: ['**/src/**', 'react', 'react-dom', 'three', '@react-three/*'],
        message: 'The server must not import client code.',
      },
    ]),
  },
  {
    files: ['shared/**'],
    rules: restrict([
      {
        group: [
          '**/server/**',
          '**/src/**',
          'react',
          'react-*',
          'three',
          'three/*',
          '@react-three/*',
          'express',
          'drizzle-orm',
          'drizzle-orm/*',
          'pg',
          'node:*',
        ],
        message: 'shared/ is pure: no UI, server, database or Node built-ins.',
      },
    ]),
  },
);
