import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'api',
    include: ['src/**/*.test.ts', 'scripts/**/*.test.ts'],
    globalSetup: ['test/global-setup.ts'],
    setupFiles: ['test/block-outbound.ts'],
    // Files share one database; they run one after another so their counts do not race.
    fileParallelism: false,
    testTimeout: 20_000,
    hookTimeout: 60_000,
  },
});
