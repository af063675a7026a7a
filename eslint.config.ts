import js from '@eslint/js';
import { importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'uploads-dev', '.data', 'tests/.artifacts', 'server/db/migrations'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
      // Imports flow one way (CONVENTIONS.md 1): shared ← server, shared ← src; features never import each other.
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./src', './server'], message: 'shared/ is used by both sides and imports neither.' },
            { target: './src', from: './server', message: 'The client never imports server code.' },
            { target: './server', from: './src', message: 'The server never imports client code.' },
            { target: './src/features', from: './src/app', message: 'Features do not import the app layer.' },
            { target: ['./src/components', './src/lib', './src/hooks'], from: ['./src/features', './src/app'], message: 'Shared client code stays below features.' },
          ],
        },
      ],
    },
  },
);
