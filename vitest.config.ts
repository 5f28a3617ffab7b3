import { defineConfig } from 'vitest/config';

// One run covers every workspace; each project keeps its own environment and includes.
export default defineConfig({
  test: {
    // Two files at a time on the two-core machines this runs on (vitest's default leaves one
    // core to itself). Projects that must not overlap their own files say fileParallelism: false.
    maxWorkers: 2,
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
