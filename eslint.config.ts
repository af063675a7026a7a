import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/** A client feature imports no other feature: shared pieces live in src/components or src/lib, and src/app composes features. */
const clientFeatures = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);
const featureZones = clientFeatures.map((name) => ({
  target: `./src/features/${name}`,
  from: './src/features',
  except: [`./${name}`],
  message:
    'A feature does not import another feature: move the shared piece to src/components or src/lib, or compose them in src/app.',
}));

const formattingSyntax = [
  {
    selector: 'CallExpression[callee.property.name=/^toLocale(Date|Time)?String$/]',
    message: 'Format dates with src/lib/format.ts (client) or server/format.ts (server).',
  },
  {
    selector:
      "NewExpression[callee.object.name='Intl'][callee.property.name=/^(DateTimeFormat|NumberFormat|RelativeTimeFormat)$/]",
    message: 'Format with shared/format (src/lib/format.ts, server/format.ts) or shared/money.',
  },
];

/** `api()` with a type named by hand, or without `schema`/`noBody`: its answer would be checked against nothing. */
const apiWithoutSchema =
  "Name the answer's shared schema: api(path, { schema }) or apiGet(path, schema); { noBody: true } for a 204.";
const contractSyntax = [
  { selector: "CallExpression[callee.name='api'][typeArguments]", message: apiWithoutSchema },
  { selector: "CallExpression[callee.name='api'][arguments.length<2]", message: apiWithoutSchema },
  {
    selector:
      "CallExpression[callee.name='api'] > ObjectExpression:not(:has(> Property[key.name=/^(schema|noBody)$/]))",
    message: apiWithoutSchema,
  },
];

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'uploads-dev', '.data', 'tests/.artifacts', 'server/db/migrations'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    // Imports are written without extensions: without a resolver that tries .ts and .tsx the path rules below see
    // no file and pass every import.
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'] })],
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
      // Imports flow one way (CONVENTIONS.md 1): shared ← server, shared ← src; features never import each other.
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './shared',
              from: ['./src', './server'],
              message: 'shared/ is used by both sides and imports neither.',
            },
            { target: './src', from: './server', message: 'The client never imports server code.' },
            { target: './server', from: './src', message: 'The server never imports client code.' },
            { target: './src/features', from: './src/app', message: 'Features do not import the app layer.' },
            {
              target: ['./src/components', './src/lib', './src/hooks'],
              from: ['./src/features', './src/app'],
              message: 'Shared client code stays below features.',
            },
            {
              target: './server/http',
              from: './server/features',
              message: 'server/http is the plumbing every feature uses; it imports no feature.',
            },
            ...featureZones,
          ],
        },
      ],
      'no-restricted-globals': [
        'error',
        {
          name: 'confirm',
          message: 'Use the in-app confirmation dialog (src/components), never the browser confirm().',
        },
      ],
    },
  },
  {
    // Formatting for people goes through shared/format (src/lib/format.ts, server/format.ts), in the person's locale and zone.
    files: ['src/**/*.{ts,tsx}', 'server/**/*.ts', 'shared/**/*.ts'],
    ignores: ['shared/format/**', 'shared/money/**', '**/*.test.{ts,tsx}'],
    rules: { 'no-restricted-syntax': ['error', ...formattingSyntax] },
  },
  {
    // The contract: every client request names the shared schema of its answer, or says it has none (decision 45).
    files: ['src/**/*.{ts,tsx}'],
    ignores: ['**/*.test.{ts,tsx}'],
    rules: { 'no-restricted-syntax': ['error', ...formattingSyntax, ...contractSyntax] },
  },
  {
    // Layers on the server: routes → service → repo. A route handler validates, guards and answers; queries live in repos.
    files: ['server/features/**/*.routes.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['drizzle-orm', 'drizzle-orm/*'],
              message: 'Route handlers run no queries: put the query in the feature repo (<feature>.repo.ts).',
            },
            {
              group: ['**/db/schema', '**/db/schema/*'],
              message: 'Route handlers run no queries: put the query in the feature repo (<feature>.repo.ts).',
            },
          ],
        },
      ],
    },
  },
);
