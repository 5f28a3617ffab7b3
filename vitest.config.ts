import { defineConfig } from 'vitest/config';

// One run covers every workspace; each project keeps its own environment and includes.
export default defineConfig({
  test: {
    projects: [
      'calc',
      'shared',
      'print',
      'db',
      'server',
      'ui/vitest.config.ts',
      'ui/vitest.browser.config.ts',
      'verification',
      'scripts',
    ],
  },
});
