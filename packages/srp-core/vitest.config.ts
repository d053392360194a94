import { defineProject } from 'vitest/config';

export default defineProject({ test: { name: 'srp-core', include: ['src/**/*.test.ts'] } });
