import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'calc',
    include: ['src/**/*.test.ts'],
    setupFiles: ['./src/testing/fast-check-setup.ts'],
  },
});
