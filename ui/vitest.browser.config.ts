import { defineConfig } from 'vitest/config';

// Browser tests: playwright-core drives Debian's chromium against HOLDFAST_E2E_URL.
export default defineConfig({
  test: {
    name: 'browser',
    include: ['e2e/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120000,
    hookTimeout: 180000,
  },
});
