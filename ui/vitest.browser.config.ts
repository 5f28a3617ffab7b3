import { defineConfig } from 'vitest/config';

// Browser tests: playwright-core drives Debian's chromium against the app under test. Two files
// run at once, each against its own app and database (see e2e/support/browser.ts).
export default defineConfig({
  test: {
    name: 'browser',
    include: ['e2e/**/*.test.ts'],
    environment: 'node',
    testTimeout: 120000,
    hookTimeout: 180000,
  },
});
