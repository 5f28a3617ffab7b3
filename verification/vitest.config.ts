import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: { name: 'verification', include: ['**/*.test.ts'], exclude: ['node_modules/**'] },
});
