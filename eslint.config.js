// ESLint for the whole tree: the Expo SDK 56 config (TypeScript, React, hooks, imports),
// Prettier's config last so that formatting is Prettier's alone (`npm run format:check`),
// and the project's own rules below.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const prettierConfig = require('eslint-config-prettier');

module.exports = defineConfig([
  expoConfig,
  prettierConfig,
  {
    rules: {
      // `fc.assert`, `fc.property`: fast-check is meant to be used as a namespace.
      'import/no-named-as-default-member': 'off',
      // tsc (run beside ESLint in `npm test`) already checks every `import * as` member; this rule
      // parsed the imported modules again, node_modules included: 9.8 s of ESLint's 23.6 s of rules.
      'import/namespace': 'off',
    },
  },
  {
    // The harness's public surface: outside harness/ (and tests/, which mirror the tree), the
    // harness is imported only through harness/index.ts (server, scripts) and harness/web.ts
    // (the web app, which must not pull index.ts's mathjs and node-only modules into its bundle).
    files: ['{app,bin,client,components,constants,scripts,server,shared}/**/*.{js,cjs,mjs,ts,tsx}'],
    rules: {
      'import/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: [
                './app',
                './bin',
                './client',
                './components',
                './constants',
                './scripts',
                './server',
                './shared',
              ],
              from: './harness',
              except: ['./index.ts', './web.ts'],
              message:
                'harness-surface: import the harness through harness/index.ts (or harness/web.ts in the web app).',
            },
            {
              target: ['./app', './client', './components', './constants'],
              from: './harness/index.ts',
              message:
                'harness-surface: the web app imports harness/web.ts; harness/index.ts would pull mathjs and node-only modules into the bundle.',
            },
          ],
        },
      ],
    },
  },
  {
    // No React in the harness, the server, the scripts, shared/ and their tests: React's rules
    // (the hooks rules analyse every function) only cost time there, 6.6 s of ESLint's 23.6 s of
    // rule time went to react-hooks/static-components alone.
    files: [
      '{bin,harness,scripts,server,shared}/**/*.{js,cjs,mjs,ts}',
      'tests/{e2e,external,harness,scripts,server,shared}/**/*.{js,cjs,mjs,ts}',
    ],
    rules: Object.fromEntries(
      expoConfig
        .flatMap((c) => Object.keys(c.rules ?? {}))
        .filter((rule) => /^react(-hooks)?\//.test(rule))
        .map((rule) => [rule, 'off']),
    ),
  },
  {
    // jest.mock factories and isolated module loads need require().
    files: ['tests/**'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    ignores: [
      'dist/**',
      'packages/cli/dist/**',
      'packages/cli/harness/**',
      '.data/**',
      '.expo/**',
      'test-results/**',
      'coverage/**',
      'node_modules/**',
      '.scratch/**',
    ],
  },
]);
