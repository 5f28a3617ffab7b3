import { defineConfig } from 'vitest/config';

// Browser tests: playwright-core drives Debian's chromium against the app under test. Under
// `npm test` two files run at once, each against its own app and database (HOLDFAST_E2E_URLS, see
// e2e/support/browser.ts); against one app given by hand they run one at a time.
const lanes = (process.env.HOLDFAST_E2E_URLS ?? '').split(/\s+/).filter(Boolean).length;

export default defineConfig({
  test: {
    name: 'browser',
    fileParallelism: lanes > 1,
    include: ['e2e/**/*.test.ts'],
    environment: 'node',
    testTimeout: 120000,
    hookTimeout: 180000,
  },
});
