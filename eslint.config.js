/* global __dirname */
// Expo's flat config plus the rules this project cares about: features stay independent, app/ holds
// routes only, route files (app/ and server/routes/) do not import each other, and db/ stands alone.
const fs = require('node:fs');
const path = require('node:path');
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

const FEATURES = fs.readdirSync(path.join(__dirname, 'features'), { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name);
const apart = (dir, message) => ({ basePath: __dirname, zones: [{ target: `./${dir}`, from: `./${dir}`, message }] });

module.exports = defineConfig([
  expoConfig,
  { ignores: ['dist/*', '.expo/*', '.data/*', '.cache/*', 'public/*', 'node_modules/*', 'test-results/*'] },
  {
    files: ['features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/features/*'], message: 'Features do not import each other; compose them in app/.' }] }],
      // The same for relative paths ('../../rigs/...'), resolved to the folder they reach.
      'import/no-restricted-paths': ['error', {
        basePath: __dirname,
        zones: FEATURES.map((f) => ({ target: `./features/${f}`, from: './features', except: [`./${f}`], message: 'Features do not import each other; compose them in app/.' })),
      }],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/app/*'], message: 'A route file does not import another route file: move what they share into features/.' }] }],
      'import/no-restricted-paths': ['error', apart('app', 'A route file does not import another route file: move what they share into features/.')],
    },
  },
  {
    files: ['server/routes/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/server/routes/*'], message: 'Routers do not import each other; app.ts mounts them, services hold what they share.' }] }],
      'import/no-restricted-paths': ['error', apart('server/routes', 'Routers do not import each other; app.ts mounts them, services hold what they share.')],
    },
  },
  {
    files: ['db/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/server/*', '**/server/*'], message: 'db/ imports nothing from server/: commands that need the app live in scripts/.' }] }],
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
