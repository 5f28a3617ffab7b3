import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Component tests (jsdom). Browser tests have their own config, vitest.browser.config.ts;
// vitest does not read `projects` nested inside a project listed by the root config.
export default defineConfig({
  plugins: [react()],
  test: {
    name: 'ui',
    include: ['src/**/*.test.{ts,tsx}'],
    environment: 'jsdom',
    setupFiles: ['./src/testing/setup.ts'],
    // Mantine screens mount slowly in jsdom while other suites run beside them.
    testTimeout: 20000,
    // Files share one module graph (the project loads in about 34 s instead of 107 s). What a
    // file leaves in module stores or storage is cleared after each test in src/testing/setup.ts.
    isolate: false,
  },
});
