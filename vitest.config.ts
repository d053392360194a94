import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: { projects: ['apps/*', 'packages/*', 'apps/web/vitest.e2e.config.ts'] },
});
