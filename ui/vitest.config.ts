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
    // The files share one jsdom and module graph instead of loading React, Mantine and jsdom
    // again for each (107 s to 34 s for the project, measured). The setup file unmounts, restores
    // mocks and unstubs globals after every test, so files do not see each other's state.
    isolate: false,
  },
});
