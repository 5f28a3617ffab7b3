import { defineConfig } from 'vitest/config';

// e2e suites share one test database, so files run one after another.
export default defineConfig({
  test: {
    name: 'server',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    fileParallelism: false,
    testTimeout: 30000,
    hookTimeout: 60000,
  },
});
