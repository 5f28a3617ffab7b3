import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The API runs on its own port in development; the built UI is served by the server itself.
const apiTarget = process.env.HOLDFAST_API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  // convert-units (used by the calc core in the browser) carries old lodash code that reads `global`.
  define: { global: 'globalThis' },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  preview: { host: '127.0.0.1', port: 4173 },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    chunkSizeWarningLimit: 700,
  },
});
