import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  resolve: {
    alias: [
      { find: /^react-native$/, replacement: 'react-native-web' },
      { find: /^@\//, replacement: root },
    ],
    extensions: ['.web.tsx', '.web.ts', '.tsx', '.ts', '.mjs', '.js', '.json'],
  },
  define: { __DEV__: 'true' },
  test: {
    include: ['tests/**/*.test.{ts,tsx}'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    // Server tests share the test database; one file at a time keeps them independent.
    fileParallelism: false,
    // Generous: a busy 2-core machine runs the job tests slowly; speed is measured in the bench, not here.
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
