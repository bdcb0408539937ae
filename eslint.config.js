// Expo's flat config plus the two rules this project cares about: features stay independent, and
// app/ holds routes only.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

module.exports = defineConfig([
  expoConfig,
  { ignores: ['dist/*', '.expo/*', '.data/*', '.cache/*', 'public/*', 'node_modules/*', 'test-results/*'] },
  {
    files: ['features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/features/*'], message: 'Features do not import each other; compose them in app/.' }] }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [
        { group: ['react', 'react-native', '@/features/*', '@/components/*', '@/server/*', '@/db/*', 'kysely', 'pg', 'node:*'], message: 'shared/ is pure: no React, database or I/O.' },
      ] }],
    },
  },
]);
