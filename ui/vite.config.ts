import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';

// The API runs on its own port in development; the built UI is served by the server itself.
const apiTarget = process.env.HOLDFAST_API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [
    react(),
    // A service worker keeps the app shell (HTML, scripts, styles, fonts) on the device, so a
    // fitter can open the field-record form without a connection; records wait in IndexedDB
    // (features/field-records/offline). /api is never cached: data always comes from the server.
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: false,
      manifest: false,
      workbox: {
        globPatterns: ['**/*.{js,css,html,woff,svg,png}'],
        navigateFallback: 'index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
        maximumFileSizeToCacheInBytes: 6 * 1024 * 1024,
        cleanupOutdatedCaches: true,
      },
    }),
  ],
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
