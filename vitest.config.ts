import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${root}` },
      { find: /^server-only$/, replacement: `${root}tests/support/empty.ts` },
    ],
  },
  test: {
    include: ['lib/**/*.test.ts', 'blocks/**/*.test.ts', 'db/**/*.test.ts', 'components/**/*.test.ts', 'tests/{unit,reference,integration}/**/*.test.ts'],
    exclude: ['node_modules/**', 'tests/e2e/**'],
    globalSetup: ['tests/support/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
