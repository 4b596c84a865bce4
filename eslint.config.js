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
    },
  },
  {
    // jest.mock factories and isolated module loads need require().
    files: ['tests/**'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    ignores: ['dist/**', '.data/**', '.expo/**', 'test-results/**', 'coverage/**', 'node_modules/**', '.scratch/**'],
  },
]);
