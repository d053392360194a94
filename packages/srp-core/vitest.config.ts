import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'srp-core',
    include: ['src/**/*.test.ts', 'io/**/*.test.ts', 'cli/**/*.test.ts'],
    // The command-line tests start Node processes; a loaded CI machine needs more than 5 s.
    testTimeout: 30_000,
  },
});
