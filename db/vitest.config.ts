import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: { name: 'db', include: ['test/**/*.test.ts'], fileParallelism: false, testTimeout: 30000 },
});
