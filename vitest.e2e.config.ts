import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = fileURLToPath(new URL('.', import.meta.url));

// Browser tests: a production build (NEXT_DIST_DIR=.next-test) served on a free loopback
// port against its own database, driven by playwright-core on Debian's Chromium.
export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${root}` },
      { find: /^server-only$/, replacement: `${root}tests/support/empty.ts` },
    ],
  },
  test: {
    include: ['tests/e2e/**/*.test.ts', 'blocks/**/*.e2e.test.ts'],
    globalSetup: ['tests/support/global-setup.ts', 'tests/e2e/support/app-server.ts'],
    testTimeout: 90_000,
    hookTimeout: 180_000,
    fileParallelism: false,
    pool: 'forks',
  },
});
