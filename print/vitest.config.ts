import { defineConfig } from 'vitest/config';

// Renders are CPU-bound and the render-pool test starts worker threads: generous timeouts.
export default defineConfig({
  test: {
    name: 'print',
    include: ['src/**/*.test.ts'],
    testTimeout: 30000,
    hookTimeout: 60000,
  },
});
