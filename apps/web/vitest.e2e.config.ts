import { defineProject } from 'vitest/config';

/** Browser end-to-end tests: the real API and database, the built client, Debian's Chromium. */
export default defineProject({
  test: {
    name: 'e2e',
    include: ['e2e/**/*.e2e.test.ts'],
    globalSetup: ['e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
