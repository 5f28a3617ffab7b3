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
    // Isolated per file: with one shared module graph (107 s to 34 s) Mantine's notification
    // store carried one file's toasts into the next and failed the photo-picker tests.
  },
});
