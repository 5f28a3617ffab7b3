import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'scripts',
    include: ['test/**/*.test.ts'],
    // The fault tests time recovery from outside (within 2 s): one file at a time, so they are
    // not measured beside another suite's CPU.
    fileParallelism: false,
    testTimeout: 60000,
    hookTimeout: 60000,
  },
});
